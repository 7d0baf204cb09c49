// A worker that took a slot search or campaign plan and died (no more heartbeats) is noticed by the others' sweep:
// the row goes back to the queue and is finished on a retry well before pg-boss would have expired the job.
import { eq, sql } from 'drizzle-orm';
import { campaigns, slotSearches } from '../../../db/schema';
import { QUEUES } from '../../../server/jobs/queue';
import { sweepStalledSlotJobs } from '../../../server/jobs/slot-sweeper';
import { registerSlotWorker } from '../../../server/jobs/slot-worker';
import type { SlotSearchJob } from '../../../server/services/ports';
import { slotEngine } from '../../../server/services/campaigns/slot-engine';
import { finishWaitingJobs } from '../helpers/finish-waiting-jobs';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { waitFor } from '../jobs/helpers/demo-db';
import { setupSlotsApp, type SlotsContext } from './helpers';

// This file searches and plans in April 2029 only (slot-search tests: March; campaigns tests: May).
const NOW = new Date('2029-02-01T08:00:00Z');
let ctx: SlotsContext;
const started: TestJobs[] = [];

beforeAll(async () => {
  ctx = await setupSlotsApp(NOW);
});
afterAll(async () => {
  for (const j of started) await j.stop();
  await ctx.close();
});
// Each test leaves searches and plannings unfinished: the next starts under the cap on waiting jobs.
beforeEach(async () => {
  await finishWaitingJobs(ctx.pool, Object.values(ctx.users).map((u) => u.id));
});

async function queueWith(): Promise<TestJobs> {
  const jobs = await startTestJobs(ctx.config);
  started.push(jobs);
  return jobs;
}

/** A search over two nights of 00:00–04:00 (network zone), stored queued through the API. */
async function storedSearch(): Promise<string> {
  const res = await (await ctx.as('engineer'))('post', '/api/slot-searches').send({
    sites: [], spans: [ctx.id('p1')], durationHours: 2,
    from: '2029-04-09T00:00:00Z', to: '2029-04-11T00:00:00Z', hours: { start: '00:00', end: '04:00' }, stepMinutes: 60,
  });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

/** A campaign of two splices over three nights, stored queued through the API. */
async function storedCampaign(): Promise<string> {
  const res = await (await ctx.as('planner'))('post', '/api/campaigns').send({
    title: `${ctx.prefix} Splice check`,
    groups: [{ label: 'North splice', spans: [ctx.id('p1')] }, { label: 'South splice', spans: [ctx.id('p2')] }],
    durationHours: 2, from: '2029-04-16T00:00:00Z', to: '2029-04-19T00:00:00Z', hours: { start: '00:00', end: '04:00' },
    stepMinutes: 60, maxPerNight: 1, minDaysBetweenTouches: 0,
  });
  expect(res.status).toBe(201);
  return res.body.id as string;
}

const tableOf = (kind: SlotSearchJob['kind']) => (kind === 'slots' ? slotSearches : campaigns);

async function readRow(kind: SlotSearchJob['kind'], id: string) {
  const table = tableOf(kind);
  const [row] = await ctx.db.select({ status: table.status, error: table.error, attempts: table.attempts, jobId: table.jobId })
    .from(table).where(eq(table.id, id));
  return row;
}

/** Sends the row's job and takes it the way a worker does, then "dies": the row says running, heartbeat old. */
async function takenByADeadWorker(jobs: TestJobs, kind: SlotSearchJob['kind'], id: string, heartbeatAgoSeconds: number) {
  const jobId = await jobs.jobs.sendSlotSearch!({ kind, id });
  const [taken] = await jobs.boss.fetch<SlotSearchJob>(QUEUES.slotSearch);
  expect(taken.id).toBe(jobId);
  const table = tableOf(kind);
  await ctx.db.update(table).set({
    status: 'running', attempts: 1, jobId, heartbeatAt: new Date(Date.now() - heartbeatAgoSeconds * 1000),
  }).where(eq(table.id, id));
  return { kind, id, jobId };
}

test('a stale search and a stale planning go back to the queue and their jobs to a retry; a live one is left alone', async () => {
  const jobs = await queueWith();
  const search = await takenByADeadWorker(jobs, 'slots', await storedSearch(), 120);
  const planning = await takenByADeadWorker(jobs, 'campaign', await storedCampaign(), 120);
  const alive = await takenByADeadWorker(jobs, 'slots', await storedSearch(), 1);

  const swept = await sweepStalledSlotJobs(ctx.db, jobs.boss, 30);
  expect(swept.map((s) => s.id).sort()).toEqual([search.id, planning.id].sort());
  for (const dead of [search, planning]) {
    expect((await readRow(dead.kind, dead.id)).status).toBe('queued');
    expect((await jobs.boss.getJobById(QUEUES.slotSearch, dead.jobId))?.state).toBe('retry');
  }
  expect((await readRow('slots', alive.id)).status).toBe('running');
  expect((await jobs.boss.getJobById(QUEUES.slotSearch, alive.jobId))?.state).toBe('active');
  // A second sweep finds nothing more: only one worker can take a row back.
  expect(await sweepStalledSlotJobs(ctx.db, jobs.boss, 30)).toEqual([]);
});

test('a stale row whose job is no longer active gets a fresh job; one whose retries are used up ends failed', async () => {
  const jobs = await queueWith();
  // A stalled worker that woke up and completed the job after all: the search itself still needs a worker.
  const woke = await takenByADeadWorker(jobs, 'slots', await storedSearch(), 120);
  await jobs.boss.complete(QUEUES.slotSearch, woke.jobId);
  // The queue already gave up on these (failed for good).
  const spent = [
    await takenByADeadWorker(jobs, 'slots', await storedSearch(), 120),
    await takenByADeadWorker(jobs, 'campaign', await storedCampaign(), 120),
  ];
  for (const s of spent) {
    await ctx.db.execute(sql.raw(`update "${jobs.schema}".job set retry_count = retry_limit where id = '${s.jobId}'`));
    await jobs.boss.fail(QUEUES.slotSearch, s.jobId, { message: 'gave up' });
    expect((await jobs.boss.getJobById(QUEUES.slotSearch, s.jobId))?.state).toBe('failed');
  }

  await sweepStalledSlotJobs(ctx.db, jobs.boss, 30);
  expect((await readRow('slots', woke.id)).status).toBe('queued');
  const fresh = await jobs.boss.fetch<SlotSearchJob>(QUEUES.slotSearch);
  expect(fresh.map((j) => j.data)).toEqual([{ kind: 'slots', id: woke.id }]);
  expect(fresh[0].id).not.toBe(woke.jobId);
  const [search, planning] = await Promise.all(spent.map((s) => readRow(s.kind, s.id)));
  expect([search.status, search.error]).toEqual(['failed', 'The search was given up: no heartbeat for 30 s: the worker stopped.']);
  expect([planning.status, planning.error]).toEqual(['failed', 'The planning was given up: no heartbeat for 30 s: the worker stopped.']);
});

test('a live worker sweeps a dead one\'s search and planning back and finishes both, long before the jobs would expire', async () => {
  const log: string[] = [];
  const jobs = await queueWith();
  // Taken by the "dead" worker before the live one polls, so the live one cannot get there first.
  const search = await takenByADeadWorker(jobs, 'slots', await storedSearch(), 10);
  const planning = await takenByADeadWorker(jobs, 'campaign', await storedCampaign(), 10);
  const worker = await registerSlotWorker(jobs.boss, {
    db: ctx.db, engine: slotEngine, pollingIntervalSeconds: 0.5, now: () => NOW, heartbeatStaleSeconds: 5, log: (l) => log.push(l),
  });
  try {
    // The jobs' expiry is 30 minutes away and this wait a minute: only the sweep (stale after 5 s) can finish them.
    const [searchDone, planned] = await Promise.all([
      waitFor('the search to be done', async () => {
        const row = await readRow('slots', search.id);
        return row.status === 'done' ? row : undefined;
      }, 60_000),
      waitFor('the campaign to be a draft', async () => {
        const row = await readRow('campaign', planning.id);
        return row.status === 'draft' ? row : undefined;
      }, 60_000),
    ]);
    expect([searchDone.attempts, planned.attempts]).toEqual([2, 2]);
    // Each came back through the sweep, which handed the same job to a retry (its id stored again on pick-up).
    expect([searchDone.jobId, planned.jobId]).toEqual([search.jobId, planning.jobId]);
    expect(log).toContain(`slot search ${search.id}: worker stopped sending heartbeats; back to the queue`);
    expect(log).toContain(`campaign ${planning.id}: worker stopped sending heartbeats; back to the queue`);
    // The queue marks a job completed once its handler returns, a moment after the row is stored.
    for (const { jobId } of [search, planning]) {
      const job = await waitFor('the job to be completed', async () => {
        const read = await jobs.boss.getJobById(QUEUES.slotSearch, jobId);
        return read?.state === 'completed' ? read : undefined;
      }, 60_000);
      expect(job.retryCount).toBe(1);
    }
  } finally {
    await worker.stop();
  }
});
