// The per-person cap on unfinished background jobs: slot searches, campaign plans and move-plan runs. One request
// over the cap is refused (429 TOO_MANY_WAITING, in words) and stores nothing; other people still queue; a finished
// job frees a place; simultaneous requests never slip past the cap together.
import type request from 'supertest';
import { parseEnv } from '../../../server/env';
import { DEFAULT_WAITING_JOB_LIMITS } from '../../../shared/job-limits';
import { finishWaitingJobs } from '../helpers/finish-waiting-jobs';
import { createRecordingQueue } from '../helpers/jobs';
import { removePrefixed } from '../helpers/remove-prefixed';
import { useScratchDatabase } from '../helpers/scratch-database';
import { signedInRequests, type AsUser } from '../helpers/sign-in';
import { insertUser, setupTestApp, testConfig, type TestContext } from '../helpers/test-app';
import { insertBackupNetwork } from '../plans/helpers';
import type { SlotSearchJob } from '../../../server/services/ports';

const NOW = new Date('2029-02-01T08:00:00Z');
type Who = 'engineer' | 'planner' | 'engineer2' | 'planner2';

let ctx: TestContext;
let as: AsUser<Who>;
let id: (name: string) => string;
let windowId: string;
const slotJobs: SlotSearchJob[] = [];
const queue = Object.assign(createRecordingQueue(), {
  async sendSlotSearch(job: SlotSearchJob) {
    slotJobs.push(job);
    return `slot-job-${slotJobs.length}`;
  },
});
const userId = (who: Who) => `${ctx.prefix}-${who}`;

beforeAll(async () => {
  await useScratchDatabase('joblimits');
  ctx = await setupTestApp();
  ({ id } = await insertBackupNetwork(ctx));
  // A second engineer and planner: someone else whose work must not be held up by the first person's cap.
  for (const [key, role] of [['engineer2', 'engineer'], ['planner2', 'planner']] as const) {
    await insertUser(ctx.db, { id: userId(key), email: `${key}.${ctx.prefix}@test.example`, name: `Second ${role}`, roles: [role] });
  }
  const app = ctx.makeApp({ now: () => NOW, jobs: queue });
  as = signedInRequests(app, (who) => `${who}.${ctx.prefix}@test.example`);
  const planner = await as('planner');
  const booked = await planner('post', '/api/windows').send({
    title: `${ctx.prefix} p1 splice`, startsAt: '2029-09-02T22:00:00Z', endsAt: '2029-09-03T02:00:00Z', workType: 'fibre splice',
    elements: [{ kind: 'span', id: id('p1'), effect: 'down' }],
  });
  expect(booked.status).toBe(201);
  windowId = booked.body.window.id as string;
  expect((await planner('post', `/api/windows/${windowId}/assess`).send({})).status).toBe(200);
});
afterAll(async () => {
  await removePrefixed(ctx.pool, ctx.prefix, [
    ['windows', ['title', 'owner_id']], ['campaigns', ['created_by']], ['slot_searches', ['created_by']],
  ]);
  await ctx.close();
});
beforeEach(async () => {
  await finishWaitingJobs(ctx.pool, (['engineer', 'planner', 'engineer2', 'planner2'] as const).map(userId));
});

type Kind = {
  name: string;
  table: 'slot_searches' | 'campaigns' | 'plans';
  limit: number;
  /** the first person and someone else allowed to start the same job */
  who: Who;
  other: Who;
  created: number;
  start: (send: (method: 'post', path: string) => request.Test) => request.Test;
  /** the status a finished job of this kind has */
  finished: string;
  message: string;
};

const KINDS: Kind[] = [
  {
    name: 'slot searches', table: 'slot_searches', limit: 3, who: 'engineer', other: 'engineer2', created: 201, finished: 'done',
    start: (send) => send('post', '/api/slot-searches').send({
      sites: [], spans: [id('p1')], durationHours: 2, from: '2029-08-06T00:00:00Z', to: '2029-08-08T00:00:00Z',
      hours: { start: '00:00', end: '04:00' }, stepMinutes: 60,
    }),
    message: 'You already have 3 slot searches waiting or running. Wait for one to finish, then search again.',
  },
  {
    name: 'campaign plans', table: 'campaigns', limit: 2, who: 'planner', other: 'planner2', created: 201, finished: 'draft',
    start: (send) => send('post', '/api/campaigns').send({
      title: `${ctx.prefix} Splice check`,
      groups: [{ label: 'North splice', spans: [id('p1')] }, { label: 'South splice', spans: [id('p2')] }],
      durationHours: 2, from: '2029-08-13T00:00:00Z', to: '2029-08-16T00:00:00Z', hours: { start: '00:00', end: '04:00' },
      stepMinutes: 60, maxPerNight: 1, minDaysBetweenTouches: 0,
    }),
    message: 'You already have 2 campaign plans waiting or running. Wait for one to finish, then plan this campaign again.',
  },
  {
    name: 'move-plan runs', table: 'plans', limit: 2, who: 'planner', other: 'planner2', created: 202, finished: 'done',
    start: (send) => send('post', `/api/windows/${windowId}/plans`).send({ timeLimitSeconds: 1 }),
    message: 'You already have 2 move-plan runs waiting or running. Wait for one to finish or cancel one, then run again.',
  },
];

async function rowCounts(kind: Kind, who: Who): Promise<{ unfinished: number; all: number }> {
  const { rows } = await ctx.pool.query(
    `select count(*) filter (where status in ('queued', 'running'))::int as unfinished, count(*)::int as "all"
     from ${kind.table} where created_by = $1`, [userId(who)]);
  return rows[0] as { unfinished: number; all: number };
}

async function finishOne(kind: Kind, who: Who): Promise<void> {
  const { rowCount } = await ctx.pool.query(
    `update ${kind.table} set status = $2 where id = (
       select id from ${kind.table} where created_by = $1 and status in ('queued', 'running') order by created_at limit 1)`,
    [userId(who), kind.finished]);
  expect(rowCount).toBe(1);
}

const jobsSent = () => slotJobs.length + queue.planRuns.length;

test('the caps in use are the documented defaults', () => {
  expect(DEFAULT_WAITING_JOB_LIMITS).toEqual({ slotSearches: 3, campaignPlans: 2, planRuns: 2 });
  expect(ctx.config.waitingJobLimits).toEqual(DEFAULT_WAITING_JOB_LIMITS);
});

describe.each(KINDS)('$name', (kind) => {
  test('one more than the cap is refused in words and stores nothing; someone else still queues; a finished job frees a place', async () => {
    const send = await as(kind.who);
    for (let i = 0; i < kind.limit; i += 1) expect((await kind.start(send)).status).toBe(kind.created);
    const before = await rowCounts(kind, kind.who);
    const sent = jobsSent();

    const refused = await kind.start(send);
    expect(refused.status).toBe(429);
    expect(refused.body.error).toEqual({ code: 'TOO_MANY_WAITING', message: kind.message });
    expect(await rowCounts(kind, kind.who)).toEqual({ unfinished: kind.limit, all: before.all });
    expect(jobsSent()).toBe(sent);

    expect((await kind.start(await as(kind.other))).status).toBe(kind.created);

    await finishOne(kind, kind.who);
    expect((await kind.start(send)).status).toBe(kind.created);
    expect((await rowCounts(kind, kind.who)).unfinished).toBe(kind.limit);
    expect((await kind.start(send)).status).toBe(429);
  });

  test('two requests at once, one place left: exactly one is taken and the cap holds', async () => {
    const send = await as(kind.who);
    for (let i = 0; i < kind.limit - 1; i += 1) expect((await kind.start(send)).status).toBe(kind.created);
    const answers = await Promise.all([kind.start(send), kind.start(send)]);
    expect(answers.map((a) => a.status).sort()).toEqual([kind.created, 429].sort());
    expect((await rowCounts(kind, kind.who)).unfinished).toBe(kind.limit);
  });
});

test('a refused campaign plan or move-plan run leaves no audit entry', async () => {
  const planner = await as('planner');
  const audits = async () => Number((await ctx.pool.query(
    `select count(*) from audit_log where actor_id = $1 and action in ('campaign.create', 'plan.enqueue')`, [userId('planner')])).rows[0].count);
  for (const kind of KINDS.filter((k) => k.who === 'planner')) {
    for (let i = 0; i < kind.limit; i += 1) expect((await kind.start(planner)).status).toBe(kind.created);
    const before = await audits();
    expect((await kind.start(planner)).status).toBe(429);
    expect(await audits()).toBe(before);
  }
});

test('the server environment changes a cap, and the message counts in the singular', async () => {
  const config = testConfig({ WAITING_SLOT_SEARCHES_PER_PERSON: '1' });
  const strict = signedInRequests(ctx.makeApp({ now: () => NOW, jobs: queue, config }), (who: Who) => `${who}.${ctx.prefix}@test.example`);
  const send = await strict('engineer');
  expect((await KINDS[0].start(send)).status).toBe(201);
  const refused = await KINDS[0].start(send);
  expect(refused.status).toBe(429);
  expect(refused.body.error.message).toBe('You already have 1 slot search waiting or running. Wait for one to finish, then search again.');
});

test('a cap below one is a configuration error naming the variable', () => {
  expect(() => parseEnv({ DATABASE_URL: 'postgres://x@127.0.0.1/db', WAITING_PLAN_RUNS_PER_PERSON: '0' }))
    .toThrow(/WAITING_PLAN_RUNS_PER_PERSON/);
});
