// A worker that took a run and died (no more heartbeats) is noticed by the others' sweep: the run goes back to
// the queue and is completed well before pg-boss would have expired the job.
import { eq, sql } from 'drizzle-orm';
import { createDb, type Db } from '../../../db/client';
import { plans } from '../../../db/schema';
import { sweepStalledRuns } from '../../../server/jobs/plan-sweeper';
import { QUEUES } from '../../../server/jobs/queue';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { demoConfig, insertQueuedPlan, readPlan, waitFor } from './helpers/demo-db';

const WINDOW = 'w-12';
let db: Db;
let close: () => Promise<void>;
const started: TestJobs[] = [];

beforeAll(async () => {
  const config = await demoConfig();
  const made = createDb(config.databaseUrl, { max: 2 });
  db = made.db;
  close = () => made.pool.end();
});
afterAll(async () => {
  for (const j of started) await j.stop();
  await close();
});

/** Enqueues a run and takes its job the way a worker does, then "dies": the row says running, heartbeat old. */
async function runTakenByADeadWorker(jobs: TestJobs, heartbeatAgoSeconds: number): Promise<{ planId: string; jobId: string }> {
  const planId = await insertQueuedPlan(db, WINDOW, { timeLimitSeconds: 2 });
  const jobId = await jobs.jobs.sendPlanRun(planId, { expireInSeconds: 3600 });
  await db.update(plans).set({ jobId }).where(eq(plans.id, planId));
  const [taken] = await jobs.boss.fetch(QUEUES.planRun);
  expect(taken.id).toBe(jobId);
  await db.update(plans).set({
    status: 'running', attempts: 1, startedAt: new Date(), heartbeatAt: new Date(Date.now() - heartbeatAgoSeconds * 1000),
  }).where(eq(plans.id, planId));
  return { planId, jobId };
}

test('a stale run goes back to the queue and its job to a retry; a live one is left alone', async () => {
  const jobs = await startTestJobs(await demoConfig());
  started.push(jobs);
  const dead = await runTakenByADeadWorker(jobs, 120);
  const alive = await runTakenByADeadWorker(jobs, 1);

  const swept = await sweepStalledRuns(db, jobs.boss, 30);
  expect(swept.map((s) => s.planId)).toEqual([dead.planId]);
  expect((await readPlan(db, dead.planId)).status).toBe('queued');
  expect((await jobs.boss.getJobById(QUEUES.planRun, dead.jobId))?.state).toBe('retry');
  expect((await readPlan(db, alive.planId)).status).toBe('running');
  expect((await jobs.boss.getJobById(QUEUES.planRun, alive.jobId))?.state).toBe('active');
  // A second sweep finds nothing more: only one worker can take a run back.
  expect(await sweepStalledRuns(db, jobs.boss, 30)).toEqual([]);
});

test('a stale run whose job is no longer active gets a fresh job; one whose retries are used up ends failed', async () => {
  const jobs = await startTestJobs(await demoConfig());
  started.push(jobs);
  // A stalled worker that woke up and completed the job after all: the run itself still needs a worker.
  const woke = await runTakenByADeadWorker(jobs, 120);
  await jobs.boss.complete(QUEUES.planRun, woke.jobId);
  // The queue already gave up on this one (failed for good).
  const spent = await runTakenByADeadWorker(jobs, 120);
  await db.execute(sql.raw(`update "${jobs.schema}".job set retry_count = retry_limit where id = '${spent.jobId}'`));
  await jobs.boss.fail(QUEUES.planRun, spent.jobId, { message: 'gave up' });
  expect((await jobs.boss.getJobById(QUEUES.planRun, spent.jobId))?.state).toBe('failed');

  await sweepStalledRuns(db, jobs.boss, 30);
  const fresh = await readPlan(db, woke.planId);
  expect(fresh.status).toBe('queued');
  expect(fresh.jobId).not.toBe(woke.jobId);
  expect((await jobs.boss.getJobById(QUEUES.planRun, fresh.jobId!))?.state).toBe('created');
  const given = await readPlan(db, spent.planId);
  expect([given.status, given.error]).toEqual(['failed', 'The run was given up: no heartbeat for 30 s: the worker stopped.']);
});

test('a live worker sweeps a dead one\'s run back and completes it, long before the job would expire', async () => {
  const log: string[] = [];
  const jobs = await startTestJobs(await demoConfig(), { workers: true, heartbeatStaleSeconds: 5, log: (l) => log.push(l) });
  started.push(jobs);
  const { planId, jobId } = await runTakenByADeadWorker(jobs, 10);
  // The job's expiry is an hour away and this wait a minute: only the sweep (stale after 5 s) can finish it in time.
  const done = await waitFor('the run to complete', async () => {
    const row = await readPlan(db, planId);
    return row.status === 'done' ? row : undefined;
  }, 60_000);
  expect(done.attempts).toBe(2);
  expect(done.result).not.toBeNull();
  // It came back through the sweep, which handed the same job to a retry, not through the queue's expiry.
  expect(log).toContain(`plan ${planId}: worker stopped sending heartbeats; back to the queue`);
  // The run is stored as done inside the job's handler; the queue marks the job completed once the handler
  // returns, a moment later, so wait for that too.
  const job = await waitFor('the job to be completed', async () => {
    const read = await jobs.boss.getJobById(QUEUES.planRun, jobId);
    return read?.state === 'completed' ? read : undefined;
  }, 60_000);
  expect(job.retryCount).toBe(1);
});
