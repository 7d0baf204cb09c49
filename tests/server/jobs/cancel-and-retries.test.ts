// Cancelling a run stops its thread and leaves the row cancelled; a run whose retries are used up (errors,
// overrunning its expiry, or a worker that vanished) ends `failed` with a reason instead of waiting for ever.
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { createDb } from '../../../db/client';
import { plans } from '../../../db/schema';
import { QUEUES } from '../../../server/jobs/queue';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { demoConfig, insertQueuedPlan, readPlan, waitFor } from './helpers/demo-db';
import { FAILURE_MESSAGE } from './fixtures/failing-compute';

// w-05 affects no slice: the stand-in compute modules ignore the window anyway.
const WINDOW = 'w-05';
const fixture = (name: string) => path.join(__dirname, 'fixtures', name);

type Dbh = ReturnType<typeof createDb>;

async function withJobs(computeModule: string, body: (jobs: TestJobs, h: Dbh, log: string[]) => Promise<void>) {
  const config = await demoConfig({ JOB_MAINTENANCE_SECONDS: '1' });
  const h = createDb(config.databaseUrl, { max: 2 });
  const log: string[] = [];
  const jobs = await startTestJobs(config, { workers: true, computeModule, log: (l) => log.push(l) });
  try {
    await body(jobs, h, log);
  } finally {
    await jobs.stop();
    await h.pool.end();
  }
}

const finalRow = (h: Dbh, planId: string) => waitFor('the run to end', async () => {
  const r = await readPlan(h.db, planId);
  return r.status === 'queued' || r.status === 'running' ? undefined : r;
}, 45_000);

describe('cancel', () => {
  test('a running run\'s thread is stopped and the row stays cancelled', () =>
    withJobs(fixture('endless-compute.ts'), async (jobs, h, log) => {
      const planId = await insertQueuedPlan(h.db, WINDOW, { timeLimitSeconds: 1 });
      const jobId = await jobs.jobs.sendPlanRun(planId, { expireInSeconds: 120 });
      await waitFor('progress from the thread', async () => {
        const r = await readPlan(h.db, planId);
        return r.status === 'running' && ((r.progress as { generation?: number } | null)?.generation ?? 0) > 0 ? r : undefined;
      });
      // What the plans API does: the row first, then the queue.
      await h.db.update(plans).set({ status: 'cancelled', error: 'Cancelled by a test', finishedAt: new Date() })
        .where(eq(plans.id, planId));
      await jobs.jobs.cancelPlanRun(jobId);
      const before = await readPlan(h.db, planId);
      // Logged only once the thread has been terminated.
      await waitFor('the worker to stop the thread', async () =>
        (log.some((l) => l.startsWith(`plan run ${planId}:`) && l.endsWith('cancelled')) ? true : undefined));
      // The one attempt ended as cancelled (not taken over, not retried).
      expect(log.filter((l) => l.startsWith(`plan run ${planId}:`))).toEqual([expect.stringMatching(/attempt 1, .*, cancelled$/)]);
      await new Promise((r) => setTimeout(r, 1200));
      const after = await readPlan(h.db, planId);
      expect(after.status).toBe('cancelled');
      expect(after.error).toBe('Cancelled by a test');
      expect(after.progress).toEqual(before.progress);
      expect(after.result).toBeNull();
      expect((await jobs.boss.getJobById(QUEUES.planRun, jobId))?.state).toBe('cancelled');
    }));

  test('a run cancelled while queued is never started', () =>
    withJobs(fixture('endless-compute.ts'), async (jobs, h) => {
      const planId = await insertQueuedPlan(h.db, WINDOW, { timeLimitSeconds: 1 });
      await h.db.update(plans).set({ status: 'cancelled', error: 'Cancelled by a test' }).where(eq(plans.id, planId));
      const jobId = await jobs.jobs.sendPlanRun(planId, { expireInSeconds: 120 });
      await waitFor('the job to be worked', async () =>
        ((await jobs.boss.getJobById(QUEUES.planRun, jobId))?.state === 'completed' ? true : undefined));
      const row = await readPlan(h.db, planId);
      expect(row.status).toBe('cancelled');
      expect(row.attempts).toBe(0);
      expect(row.startedAt).toBeNull();
    }));
});

describe('retries used up', () => {
  test('an error on every attempt: three attempts, then failed with the last error', () =>
    withJobs(fixture('failing-compute.ts'), async (jobs, h) => {
      const planId = await insertQueuedPlan(h.db, WINDOW, { timeLimitSeconds: 1 });
      await jobs.jobs.sendPlanRun(planId, { expireInSeconds: 120 });
      const row = await finalRow(h, planId);
      expect(row.status).toBe('failed');
      expect(row.attempts).toBe(3);
      expect(row.error).toBe(`The run was tried 3 times and given up; last error: ${FAILURE_MESSAGE}`);
      expect(row.finishedAt).not.toBeNull();
    }));

  test('a run that outlasts its job expiry is stopped by its worker and, with no retry left, failed', () =>
    withJobs(fixture('endless-compute.ts'), async (jobs, h) => {
      const planId = await insertQueuedPlan(h.db, WINDOW, { timeLimitSeconds: 1 });
      await jobs.boss.send(QUEUES.planRun, { planId }, { expireInSeconds: 3, retryLimit: 0 });
      const row = await finalRow(h, planId);
      expect(row.status).toBe('failed');
      expect(row.attempts).toBe(1);
      expect(row.error).toMatch(/^The run was tried once and given up; last error: the run outlasted its job expiry/);
    }));

  test('a worker that took the job and vanished: the queue expires it and the run is failed', () =>
    withJobs(fixture('endless-compute.ts'), async (jobs, h) => {
      const planId = await insertQueuedPlan(h.db, WINDOW, { timeLimitSeconds: 1 });
      // Sent under another name and fetched by hand, like a worker that died the moment it took the job;
      // the registered worker never sees it. Expiry then moves it to the plan-run dead-letter queue.
      const ghost = 'plan-run-ghost';
      await jobs.boss.createQueue(ghost, { name: ghost, deadLetter: QUEUES.planRunDead });
      await jobs.boss.send(ghost, { planId }, { expireInSeconds: 1, retryLimit: 0 });
      expect(await jobs.boss.fetch(ghost)).toHaveLength(1);
      const row = await finalRow(h, planId);
      expect(row.status).toBe('failed');
      expect(row.error).toBe('The worker stopped responding once; the run was given up.');
    }));
});

describe('shutdown', () => {
  test('stopping a worker mid-run hands the run back to the queue for a retry', async () => {
    const config = await demoConfig();
    const h = createDb(config.databaseUrl, { max: 2 });
    const log: string[] = [];
    const jobs = await startTestJobs(config, { workers: true, computeModule: fixture('endless-compute.ts'), log: (l) => log.push(l) });
    try {
      const planId = await insertQueuedPlan(h.db, WINDOW, { timeLimitSeconds: 1 });
      const jobId = await jobs.jobs.sendPlanRun(planId, { expireInSeconds: 120 });
      await waitFor('the run to be computing', async () =>
        ((await readPlan(h.db, planId)).progress as { generation?: number } | null)?.generation ? true : undefined);
      await jobs.worker!.stop();
      // stop() returns only once the thread is stopped and the run handed back for a retry.
      expect(log.filter((l) => l.startsWith(`plan run ${planId}:`)))
        .toEqual([expect.stringMatching(/attempt 1, .*, retry \(the worker shut down during the run\)$/)]);
      const row = await readPlan(h.db, planId);
      expect(row.status).toBe('queued');
      expect(row.progress).toBeNull();
      expect(row.attempts).toBe(1);
      const job = await waitFor('the job to wait for its retry', async () => {
        const j = await jobs.boss.getJobById(QUEUES.planRun, jobId);
        return j?.state === 'retry' ? j : undefined;
      }, 5000);
      expect((job.output as { message?: string }).message).toBe('the worker shut down during the run');
    } finally {
      await jobs.stop();
      await h.pool.end();
    }
  });
});
