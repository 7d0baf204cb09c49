// Works one plan-run job: takes the plan row, computes in a worker thread under watch, stores the outcome.
// A planner failure is stored as `failed` (retrying cannot help); anything else is thrown so the queue retries.
import type { Db } from '../../db/client';
import { planReviewSchema, planSettingsSchema, type PlanProgress } from '../../shared/plans';
import { selectPlanRow, type PlanRow } from '../queries/plans/plan-rows';
import { retryWhileDatabaseUnavailable } from '../db-unavailable';
import { finishDone, finishFailed, markRunning, requeue } from '../queries/plans/plan-run-rows';
import { loadPlanInput, RunRefusedError } from './plan-run-input';
import { ProgressBox, watchRun, type RunEnd, type StopReason } from './plan-run-watch';
import { startPlanThread } from './plan-thread';
import { observePlanRun, type PlanRunOutcome } from '../metrics/registry';

export type PlanRunDeps = {
  db: Db;
  log: (line: string) => void;
  /** absolute path of the module exporting computePlan (tests pass a stand-in) */
  computeModule?: string;
  /** receives each run's stop function while it computes (for shutdown) */
  onStopper?: (stop: ((reason: StopReason) => void) | null) => void;
};
export type PlanRunJob = { id: string; data: { planId: string }; expireInSeconds: number };

/** Stop the thread a second before the queue would expire the job, so a run never outlives its job. */
const EXPIRY_HEADROOM_MS = 1000;

function firstProgress(plan: PlanRow): PlanProgress {
  const settings = planSettingsSchema.safeParse(plan.settings);
  const timeLimitMs = settings.success ? settings.data.timeLimitSeconds * 1000 : 0;
  return { phase: 'preparing', generation: 0, evaluations: 0, best: null, elapsedMs: 0, timeLimitMs };
}

type Ctx = { deps: PlanRunDeps; plan: PlanRow; attempt: number; job: PlanRunJob; pickedAt: Date };

/** The metrics label of a logged outcome (slackwater_plan_runs_total). */
function outcomeKind(outcome: string): PlanRunOutcome {
  if (outcome === 'done') return 'done';
  if (outcome.startsWith('failed')) return 'failed';
  if (outcome.startsWith('retry')) return 'retried';
  return outcome === STOPPED.superseded ? 'superseded' : 'cancelled';
}

function logRun(c: Ctx, computeMs: number, outcome: string): void {
  observePlanRun(outcomeKind(outcome), computeMs);
  const waitMs = c.pickedAt.getTime() - c.plan.createdAt.getTime();
  c.deps.log(`plan run ${c.plan.id}: window ${c.plan.windowId}, attempt ${c.attempt}, queue wait ${waitMs} ms, `
    + `compute ${computeMs} ms, ${outcome}`);
}

export async function runPlanJob(deps: PlanRunDeps, job: PlanRunJob): Promise<void> {
  const plan = await selectPlanRow(deps.db, job.data.planId);
  // Cancelled while queued, already finished by an earlier attempt, or deleted with its window: nothing to do.
  if (!plan || (plan.status !== 'queued' && plan.status !== 'running')) return;
  const pickedAt = new Date();
  const attempt = await markRunning(deps.db, plan.id, pickedAt, firstProgress(plan));
  if (attempt === null) return;
  const c: Ctx = { deps, plan, attempt, job, pickedAt };
  let input;
  try {
    input = await loadPlanInput(deps.db, plan);
  } catch (err) {
    if (!(err instanceof RunRefusedError)) return giveBack(c, 0, err instanceof Error ? err.message : String(err));
    await finishFailed(deps.db, plan.id, attempt, err.message, new Date());
    return logRun(c, 0, `failed: ${err.message}`);
  }
  const progress = new ProgressBox();
  const thread = startPlanThread(input, (p) => progress.set(p), { computeModule: deps.computeModule });
  const startMs = Date.now();
  const end = await watchRun({
    db: deps.db, planId: plan.id, attempt, thread, progress,
    deadlineMs: Math.max(EXPIRY_HEADROOM_MS, job.expireInSeconds * 1000 - EXPIRY_HEADROOM_MS),
    onStopper: deps.onStopper,
  }).finally(() => deps.onStopper?.(null));
  await settle(c, end, progress, Date.now() - startMs);
}

/**
 * A run's closing write (its result, its failure, its hand-back) waits out a database outage: the computed
 * result is kept rather than thrown away and computed again. Guarded by the attempt, so a run another worker took
 * over meanwhile is not overwritten.
 */
function closingWrite<T>(c: Ctx, write: () => Promise<T>): Promise<T> {
  return retryWhileDatabaseUnavailable(write, {
    onWait: (_err, waitedMs) => { if (waitedMs === 0) c.deps.log(`plan run ${c.plan.id}: the database is unavailable; storing the outcome when it is back`); },
  });
}

/** The queue retries the job: the row waits as `queued` meanwhile, and the thrown error is the job's last error. */
async function giveBack(c: Ctx, computeMs: number, reason: string): Promise<never> {
  await closingWrite(c, () => requeue(c.deps.db, c.plan.id, c.attempt));
  logRun(c, computeMs, `retry (${reason})`);
  throw new Error(reason);
}

const STOPPED: Record<StopReason, string> = {
  cancelled: 'cancelled', superseded: 'taken over by another attempt',
  shutdown: 'the worker shut down during the run', expired: 'the run outlasted its job expiry',
};

async function settle(c: Ctx, end: RunEnd, progress: ProgressBox, computeMs: number): Promise<void> {
  const { db } = c.deps;
  const now = new Date();
  if (end.kind === 'stopped') {
    if (end.reason === 'cancelled' || end.reason === 'superseded') return logRun(c, computeMs, STOPPED[end.reason]);
    return giveBack(c, computeMs, STOPPED[end.reason]);
  }
  if (end.kind === 'failed') {
    if (!end.error.deterministic) return giveBack(c, computeMs, end.error.message);
    const error = `The planner could not make a plan: ${end.error.message}`;
    await closingWrite(c, () => finishFailed(db, c.plan.id, c.attempt, error, now));
    return logRun(c, computeMs, `failed: ${end.error.message}`);
  }
  const review = planReviewSchema.safeParse(end.review);
  if (!review.success) {
    const error = `The planner's review is incomplete: ${review.error.issues[0]?.message}`;
    await closingWrite(c, () => finishFailed(db, c.plan.id, c.attempt, error, now));
    return logRun(c, computeMs, 'failed: unreadable review');
  }
  const last = progress.latest ?? firstProgress(c.plan);
  const stored = await closingWrite(c, () => finishDone(db, c.plan.id, c.attempt, {
    review: review.data, progress: { ...last, phase: 'finishing', elapsedMs: computeMs }, now,
  }));
  logRun(c, computeMs, stored ? 'done' : 'cancelled before it was stored');
}
