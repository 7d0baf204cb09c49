// A plan run through the real queue and worker: queued → running (with progress) → done with a readable review;
// and the failures a retry cannot fix are stored at once with their reason.
import path from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { eq } from 'drizzle-orm';
import { createDb } from '../../../db/client';
import { windows } from '../../../db/schema';
import { planProgressSchema, planReviewSchema } from '../../../shared/plans';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { demoConfig, insertQueuedPlan, readPlan, waitFor } from './helpers/demo-db';
import { PLANNER_MESSAGE } from './fixtures/planner-error-compute';

// w-09 of the demo takes an edge site down: some fifteen affected slices, a few seconds per run.
const WINDOW = 'w-09';
// Only this file edits w-04 (affects no slice), so runs in other files never see it change.
const EDITED_WINDOW = 'w-04';
const EXPIRE_SECONDS = 120;

describe('plan runs through the queue', () => {
  let jobs: TestJobs;
  let db: ReturnType<typeof createDb>['db'];
  let pool: ReturnType<typeof createDb>['pool'];
  const logLines: string[] = [];

  beforeAll(async () => {
    const config = await demoConfig();
    ({ db, pool } = createDb(config.databaseUrl, { max: 4 }));
    jobs = await startTestJobs(config, { workers: true, log: (l) => logLines.push(l) });
  });
  afterAll(async () => {
    await jobs?.stop();
    await pool?.end();
  });

  test('an enqueued run is computed off the main thread, reports progress and stores a review', async () => {
    const planId = await insertQueuedPlan(db, WINDOW, { timeLimitSeconds: 2, seed: 7 });
    const delay = monitorEventLoopDelay({ resolution: 10 });
    delay.enable();
    await jobs.jobs.sendPlanRun(planId, { expireInSeconds: EXPIRE_SECONDS });
    const seen = await waitFor('progress while running', async () => {
      const row = await readPlan(db, planId);
      // Past `preparing` (which the worker writes as it takes the run): these figures came from the thread.
      const phase = (row.progress as { phase?: string } | null)?.phase;
      return row.status === 'running' && phase && phase !== 'preparing' ? row.progress : undefined;
    });
    expect(planProgressSchema.safeParse(seen).success).toBe(true);
    const done = await waitFor('the run to finish', async () => {
      const row = await readPlan(db, planId);
      return row.status === 'running' || row.status === 'queued' ? undefined : row;
    });
    delay.disable();
    expect(done.status).toBe('done');
    expect(done.error).toBeNull();
    expect(done.attempts).toBe(1);
    expect(done.startedAt).not.toBeNull();
    expect(done.finishedAt!.getTime()).toBeGreaterThanOrEqual(done.startedAt!.getTime());
    const review = planReviewSchema.parse(done.result);
    expect(review.affected.length).toBeGreaterThan(0);
    expect(review.slices.map((s) => s.slice).sort()).toEqual([...review.affected].sort());
    expect(planProgressSchema.parse(done.progress).phase).toBe('finishing');
    // The search and references ran for seconds; had they run on this thread, its loop would have stalled as long.
    expect(delay.max / 1e6).toBeLessThan(500);
    expect(logLines.some((l) => l.startsWith(`plan run ${planId}: window ${WINDOW}, attempt 1, queue wait `) && l.endsWith('done'))).toBe(true);
  });

  test('a run for a window edited since it was requested fails at once with the reason', async () => {
    const planId = await insertQueuedPlan(db, EDITED_WINDOW, { timeLimitSeconds: 1 });
    const [w] = await db.select({ version: windows.version }).from(windows).where(eq(windows.id, EDITED_WINDOW));
    // As an edit would: the window moves on a version; the plan row still names the old one.
    await db.update(windows).set({ version: w.version + 1 }).where(eq(windows.id, EDITED_WINDOW));
    try {
      await jobs.jobs.sendPlanRun(planId, { expireInSeconds: EXPIRE_SECONDS });
      const row = await waitFor('the run to fail', async () => {
        const r = await readPlan(db, planId);
        return r.status === 'failed' ? r : undefined;
      });
      expect(row.error).toMatch(/window was edited after this run was requested/);
      expect(row.attempts).toBe(1);
      expect(row.result).toBeNull();
    } finally {
      await db.update(windows).set({ version: w.version }).where(eq(windows.id, EDITED_WINDOW));
    }
  });
});

describe('a planner error', () => {
  test('fails the run on its first attempt, with the planner\'s message, and is not retried', async () => {
    const config = await demoConfig();
    const { db, pool } = createDb(config.databaseUrl, { max: 2 });
    const jobs = await startTestJobs(config, {
      workers: true, computeModule: path.join(__dirname, 'fixtures', 'planner-error-compute.ts'),
    });
    try {
      const planId = await insertQueuedPlan(db, WINDOW, { timeLimitSeconds: 1 });
      const jobId = await jobs.jobs.sendPlanRun(planId, { expireInSeconds: EXPIRE_SECONDS });
      const row = await waitFor('the run to fail', async () => {
        const r = await readPlan(db, planId);
        return r.status === 'failed' ? r : undefined;
      });
      expect(row.error).toBe(`The planner could not make a plan: ${PLANNER_MESSAGE}`);
      // The job itself completed: the queue has nothing left to retry.
      const job = await waitFor('the job to complete', async () => {
        const j = await jobs.boss.getJobById('plan-run', jobId);
        return j?.state === 'completed' ? j : undefined;
      });
      expect(job.retryCount).toBe(0);
      expect((await readPlan(db, planId)).attempts).toBe(1);
    } finally {
      await jobs.stop();
      await pool.end();
    }
  });
});
