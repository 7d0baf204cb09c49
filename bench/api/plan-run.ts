// One plan run on the big window through the API with the default settings, polled until it ends; the
// figures come from the run's own progress and review as the API returns them.
import { performance } from 'node:perf_hooks';
import { compareObjectives } from '../../planner/plan/evaluate-plan';
import { planResponseSchema, type Plan } from '../../shared/plans';
import type { ApiClient } from './client';

const POLL_EVERY_MS = 500;
/** Beyond its own limit, how long the bench waits for a run before giving up on it. */
const GRACE_MS = 180_000;

export type PlanFigures = {
  status: Plan['status'];
  error: string | null;
  touched: number;
  generations: number;
  evaluations: number;
  /** unresolved slices in the search's own plan, before any fallback to greedy */
  searchUnresolved: number | null;
  greedyUnresolved: number | null;
  /** the search's objective against greedy's (lexicographic): negative when the search's is better */
  versusGreedy: number | null;
  limitMs: number;
  /** started → finished as the server stamped them */
  totalMs: number | null;
  /** from sending the request to the poll that saw the run end (poll every 0.5 s) */
  seenMs: number;
  /** slowest answer to a progress poll while the run computed */
  slowestPollMs: number;
};

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const readPlan = (body: Buffer) => planResponseSchema.parse(JSON.parse(body.toString('utf8'))).plan;

function figures(plan: Plan, touched: number, polls: { seenMs: number; slowestPollMs: number }): PlanFigures {
  const review = plan.review;
  const lastTrace = review?.trace.at(-1);
  const search = review ? (review.search?.objective ?? review.objective) : null;
  const greedy = review?.greedy.objective ?? null;
  const stamps = plan.startedAt && plan.finishedAt ? Date.parse(plan.finishedAt) - Date.parse(plan.startedAt) : null;
  return {
    status: plan.status, error: plan.error, touched,
    generations: Math.max(plan.progress?.generation ?? 0, lastTrace?.generation ?? 0),
    evaluations: Math.max(plan.progress?.evaluations ?? 0, lastTrace?.evaluations ?? 0),
    searchUnresolved: search?.unresolved ?? null,
    greedyUnresolved: greedy?.unresolved ?? null,
    versusGreedy: search && greedy ? compareObjectives(search, greedy) : null,
    limitMs: plan.settings.timeLimitSeconds * 1000,
    totalMs: stamps, ...polls,
  };
}

/** Starts the run, polls GET /api/plans/:id until it is done, failed or cancelled. */
export async function runPlan(planner: ApiClient, windowId: string, touched: number): Promise<PlanFigures> {
  const sentAt = performance.now();
  const started = await planner.json<unknown>('POST', `/api/windows/${encodeURIComponent(windowId)}/plans`, {});
  let plan = planResponseSchema.parse(started).plan;
  const deadline = performance.now() + plan.settings.timeLimitSeconds * 1000 + GRACE_MS;
  let slowestPollMs = 0;
  while (plan.status === 'queued' || plan.status === 'running') {
    if (performance.now() > deadline) throw new Error(`the plan run was still ${plan.status} long after its limit`);
    await sleep(POLL_EVERY_MS);
    const res = await planner.timed('GET', `/api/plans/${encodeURIComponent(plan.id)}`);
    if (res.status !== 200) throw new Error(`polling the plan run answered HTTP ${res.status}`);
    slowestPollMs = Math.max(slowestPollMs, res.ms);
    plan = readPlan(res.body);
  }
  return figures(plan, touched, { seenMs: performance.now() - sentAt, slowestPollMs });
}
