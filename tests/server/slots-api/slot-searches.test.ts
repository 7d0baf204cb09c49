// Slot searches through the API: who may search, what a bad request answers, and a search worked by its job
// handler (queued → running → done, ranked candidates, progress), by the real queue once, and failing readably.
import { slotSearchSchema, type SlotSearch } from '../../../shared/slots';
import { finishWaitingJobs } from '../helpers/finish-waiting-jobs';
import { startTestJobs } from '../helpers/jobs';
import { signedInRequests } from '../helpers/sign-in';
import { markDeadSlotJob } from '../../../server/jobs/slot-dead-letter';
import { runSlotJob } from '../../../server/jobs/slot-search-handler';
import { registerSlotWorker } from '../../../server/jobs/slot-worker';
import { slotEngine } from '../../../server/services/campaigns/slot-engine';
import type { SlotEngine } from '../../../server/services/campaigns/engine';
import { SlotRequestError } from '../../../server/services/slots/errors';
import { setupSlotsApp, type SlotsContext } from './helpers';

// This file searches March 2029 only (the campaigns tests book in May 2029).
const NOW = new Date('2029-02-01T08:00:00Z');
let ctx: SlotsContext;

beforeAll(async () => {
  ctx = await setupSlotsApp(NOW);
});
afterAll(async () => {
  await ctx.close();
});
// Searches here stay queued (the recording queue works none): each test starts under the cap on waiting searches.
beforeEach(async () => {
  await finishWaitingJobs(ctx.pool, Object.values(ctx.users).map((u) => u.id));
});

/** Two nights of 00:00–04:00 (network zone), two-hour slots on the hour: a handful of candidates. */
function request(over: Record<string, unknown> = {}) {
  return {
    sites: [], spans: [ctx.id('p1')], durationHours: 2,
    from: '2029-03-05T00:00:00Z', to: '2029-03-07T00:00:00Z', hours: { start: '00:00', end: '04:00' }, stepMinutes: 60, ...over,
  };
}

async function read(id: string): Promise<SlotSearch> {
  const res = await (await ctx.as('engineer'))('get', `/api/slot-searches/${id}`);
  expect(res.status).toBe(200);
  return slotSearchSchema.parse(res.body);
}

async function startSearch(over: Record<string, unknown> = {}): Promise<string> {
  const res = await (await ctx.as('engineer'))('post', '/api/slot-searches').send(request(over));
  expect(res.status).toBe(201);
  return res.body.id as string;
}

const quiet = () => undefined;

describe('roles', () => {
  test('engineers, planners and admins search; a tenant finds no such route; an approver is refused', async () => {
    for (const who of ['engineer', 'planner', 'admin'] as const) {
      const res = await (await ctx.as(who))('post', '/api/slot-searches').send(request());
      expect([who, res.status]).toEqual([who, 201]);
      expect(res.body.id).toMatch(/^ss-/);
    }
    const tenant = await (await ctx.as('tenant'))('post', '/api/slot-searches').send(request());
    expect(tenant.status).toBe(404);
    expect((await (await ctx.as('approver'))('post', '/api/slot-searches').send(request())).status).toBe(403);
  });

  test('any searcher reads anyone\'s search; a tenant reads none', async () => {
    const id = await startSearch();
    expect((await (await ctx.as('planner'))('get', `/api/slot-searches/${id}`)).status).toBe(200);
    expect((await (await ctx.as('tenant'))('get', `/api/slot-searches/${id}`)).status).toBe(404);
    expect((await (await ctx.as('engineer'))('get', '/api/slot-searches/ss-missing')).body.error.code).toBe('SLOT_SEARCH_NOT_FOUND');
  });
});

describe('validation', () => {
  test('no elements, a range backwards or too long: 400 with the field and the words', async () => {
    const engineer = await ctx.as('engineer');
    const none = await engineer('post', '/api/slot-searches').send(request({ spans: [] }));
    expect(none.status).toBe(400);
    expect(none.body.error.message).toContain('Pick at least one site or span');
    const backwards = await engineer('post', '/api/slot-searches').send(request({ to: '2029-03-01T00:00:00Z' }));
    expect(backwards.body.error.details).toEqual(expect.arrayContaining([{ path: '$.to', message: 'The range must end after it starts.' }]));
    const long = await engineer('post', '/api/slot-searches').send(request({ to: '2029-09-01T00:00:00Z' }));
    expect(long.status).toBe(400);
    expect(long.body.error.message).toContain('at most 92 days');
    const badHours = await engineer('post', '/api/slot-searches').send(request({ hours: { start: '25:00', end: '04:00' } }));
    expect(badHours.status).toBe(400);
  });

  test('an unknown element or work longer than the allowed hours is a 400 before anything is queued', async () => {
    const engineer = await ctx.as('engineer');
    const queued = ctx.queue.slotJobs.length;
    const unknown = await engineer('post', '/api/slot-searches').send(request({ sites: ['nowhere-site'] }));
    expect(unknown.status).toBe(400);
    expect(unknown.body.error).toMatchObject({ code: 'SLOT_REQUEST_INVALID' });
    expect(unknown.body.error.message).toContain('nowhere-site');
    const tooLong = await engineer('post', '/api/slot-searches').send(request({ durationHours: 6 }));
    expect(tooLong.status).toBe(400);
    expect(ctx.queue.slotJobs.length).toBe(queued);
  });

  test('without a slot-search queue the search answers 503 and is stored as failed', async () => {
    const app = ctx.makeApp({ now: () => NOW });
    const engineer = await signedInRequests(app, (who: 'engineer') => ctx.users[who].email)('engineer');
    const failed = async () => (await ctx.pool.query(
      "select error from slot_searches where created_by = $1 and status = 'failed'", [ctx.users.engineer.id])).rows as { error: string }[];
    const before = (await failed()).length;
    const res = await engineer('post', '/api/slot-searches').send(request());
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('QUEUE_UNAVAILABLE');
    const after = await failed();
    expect(after.length).toBe(before + 1);
    expect(after.some((r) => r.error.startsWith('The job queue did not take the slot search'))).toBe(true);
  });
});

describe('the job handler', () => {
  test('queued → running (with progress) → done: usable candidates ranked 1..n, then the excluded ones', async () => {
    const id = await startSearch();
    expect(ctx.queue.slotJobs.at(-1)).toEqual({ kind: 'slots', id });
    expect((await read(id)).status).toBe('queued');
    const seenWhileRunning: string[] = [];
    const watching: SlotEngine = {
      ...slotEngine,
      findSlots: (db, req, opts) => slotEngine.findSlots(db, req, {
        ...opts,
        onProgress: async (p) => {
          await opts.onProgress?.(p);
          const now = await read(id);
          seenWhileRunning.push(`${now.status}:${now.progress ? 'progress' : 'none'}`);
        },
      }),
    };
    await runSlotJob({ db: ctx.db, engine: watching, log: quiet, now: () => NOW, progressEveryMs: 0 }, { id: 'job', data: { kind: 'slots', id } });
    expect(seenWhileRunning.length).toBeGreaterThan(0);
    expect(new Set(seenWhileRunning)).toEqual(new Set(['running:progress']));

    const done = await read(id);
    expect(done.status).toBe('done');
    expect(done.error).toBeNull();
    expect(done.progress).toMatchObject({ phase: 'finishing' });
    expect(done.progress!.total).toBe(done.candidates.length);
    expect(done.candidates.length).toBeGreaterThan(0);
    const usable = done.candidates.filter((c) => c.rank !== null);
    expect(usable.map((c) => c.rank)).toEqual(usable.map((_, i) => i + 1));
    // Usable first, then excluded, each with its reason.
    expect(done.candidates.slice(0, usable.length)).toEqual(usable);
    for (const c of done.candidates.slice(usable.length)) expect(c.excluded?.reason).toBeTruthy();
    expect(done.summary).toMatchObject({ usable: usable.length, excluded: done.candidates.length - usable.length });
    // The heading names the span by its end sites.
    expect(done.elements).toEqual([{ kind: 'span', id: ctx.id('p1'), name: 'Site A – Site B' }]);
    expect(done.finishedAt).not.toBeNull();
  });

  test('a request error found while searching fails the search with its words, at once', async () => {
    const id = await startSearch();
    const refusing: SlotEngine = { ...slotEngine, findSlots: () => Promise.reject(new SlotRequestError(['These sites or spans do not exist: X.'])) };
    await runSlotJob({ db: ctx.db, engine: refusing, log: quiet }, { id: 'job', data: { kind: 'slots', id } });
    expect(await read(id)).toMatchObject({ status: 'failed', error: 'These sites or spans do not exist: X.', candidates: [] });
  });

  test('an unexpected error hands the search back to the queue; used-up retries fail it readably', async () => {
    const id = await startSearch();
    const broken: SlotEngine = { ...slotEngine, findSlots: () => Promise.reject(new Error('connection reset')) };
    await expect(runSlotJob({ db: ctx.db, engine: broken, log: quiet }, { id: 'job', data: { kind: 'slots', id } })).rejects.toThrow('connection reset');
    expect((await read(id)).status).toBe('queued');
    await markDeadSlotJob(ctx.db, { data: { kind: 'slots', id }, output: { message: 'connection reset' }, retryCount: 1 }, quiet);
    const dead = await read(id);
    expect(dead.status).toBe('failed');
    expect(dead.error).toBe('The run was tried 2 times and given up; last error: connection reset');
  });

  test('a worker that stops mid-search hands it back to the queue, not failed', async () => {
    const id = await startSearch();
    const stopping = { aborted: false };
    const stopped: SlotEngine = {
      ...slotEngine,
      findSlots: (db, req, opts) => slotEngine.findSlots(db, req, { ...opts, onProgress: () => { stopping.aborted = true; } }),
    };
    await expect(runSlotJob({ db: ctx.db, engine: stopped, log: quiet, now: () => NOW, stopping }, { id: 'job', data: { kind: 'slots', id } }))
      .rejects.toThrow('stopped');
    expect(await read(id)).toMatchObject({ status: 'queued', error: null, progress: null });
  });

  test('a finished search is not worked again', async () => {
    const id = await startSearch();
    await runSlotJob({ db: ctx.db, engine: slotEngine, log: quiet, now: () => NOW }, { id: 'job', data: { kind: 'slots', id } });
    const first = await read(id);
    const never: SlotEngine = { ...slotEngine, findSlots: () => Promise.reject(new Error('must not run')) };
    await runSlotJob({ db: ctx.db, engine: never, log: quiet }, { id: 'job', data: { kind: 'slots', id } });
    expect(await read(id)).toEqual(first);
  });
});

test('through the real queue: the worker takes the job and the search is done', async () => {
  const jobs = await startTestJobs(ctx.config);
  const worker = await registerSlotWorker(jobs.boss, { db: ctx.db, engine: slotEngine, pollingIntervalSeconds: 0.5, now: () => NOW });
  try {
    const app = ctx.makeApp({ now: () => NOW, jobs: jobs.jobs });
    const engineer = await signedInRequests(app, (who: 'engineer') => ctx.users[who].email)('engineer');
    const created = await engineer('post', '/api/slot-searches').send(request());
    expect(created.status).toBe(201);
    let search: SlotSearch | null = null;
    for (const until = Date.now() + 60_000; Date.now() < until;) {
      search = slotSearchSchema.parse((await engineer('get', `/api/slot-searches/${created.body.id}`)).body);
      if (search.status === 'done' || search.status === 'failed') break;
      await new Promise((r) => setTimeout(r, 100));
    }
    expect(search?.status).toBe('done');
    expect(search!.candidates.filter((c) => c.rank !== null).length).toBeGreaterThan(0);
  } finally {
    await worker.stop();
    await jobs.stop();
  }
});
