// A fast restart of PostgreSQL (SIGINT to the postmaster) while a plan run computes and mail is queued, on a
// cluster of this test's own: the process survives, requests in the gap answer 503 DATABASE_UNAVAILABLE,
// /api/ready is 503 then 200 without a restart of the app, the plan run finishes, and every mail arrives once.
import pg from 'pg';
import request from 'supertest';
import { startBackground, type Background } from '../../../server/background';
import { QUEUES } from '../../../server/jobs/queue';
import { readSinkMessages } from '../../../server/queries/mail/sink-messages';
import { planResponseSchema, type Plan } from '../../../shared/plans';
import { signedInRequests } from '../helpers/sign-in';
import { testConfig } from '../helpers/test-app';
import { waitFor } from '../mail/test-boss';
import { bookAssessed, closePlansApp, setupPlansNetwork, type PlansContext } from '../plans/helpers';
import { startTempCluster, type TempCluster } from './temp-cluster';

jest.setTimeout(180_000);

// This file books in February 2028 only (other plans files use other months: reservations follow time overlap).
const NOW = new Date('2027-03-01T08:00:00Z');
const JOB_SCHEMA = 'jobs_restart';
let cluster: TempCluster;
let ctx: PlansContext;
let id: (name: string) => string;
let background: Background;
const logLines: string[] = [];

beforeAll(async () => {
  cluster = await startTempCluster();
  const admin = new pg.Client({ connectionString: cluster.url('postgres') });
  await admin.connect();
  await admin.query('create database slackwater_restart');
  await admin.end();
  process.env.TEST_DATABASE_URL = cluster.url('slackwater_restart');
  ({ ctx, id } = await setupPlansNetwork(NOW));
  const config = testConfig({ SMTP_URL: 'sink', SMTP_SINK_PORT: '0', JOB_SCHEMA, WORKER_IN_PROCESS: 'true' });
  background = await startBackground({ db: ctx.db, config, log: (line) => logLines.push(line) });
}, 120_000);
afterAll(async () => {
  await background?.stop();
  if (ctx) await closePlansApp(ctx);
  cluster?.destroy();
});

async function mailJobStates(): Promise<Record<string, number>> {
  const res = await ctx.pool.query<{ state: string; n: number }>(
    `select state, count(*)::int as n from ${JOB_SCHEMA}.job where name = $1 group by state`, [QUEUES.mail]);
  return Object.fromEntries(res.rows.map((r) => [r.state, r.n]));
}

test('a fast restart mid-run: 503 in the gap, ready again by itself, the run finishes, each mail sent once', async () => {
  const app = ctx.makeApp({ now: () => NOW, jobs: background.jobs });
  const planner = await signedInRequests(app, (role: 'planner') => ctx.users[role].email)('planner');
  const windowId = await bookAssessed(ctx, 'p1 splice (database restart)', '2028-02-08T22:00:00Z', '2028-02-09T02:00:00Z',
    [{ kind: 'span', id: id('p1'), effect: 'down' }]);
  const enqueued = await planner('post', `/api/windows/${windowId}/plans`).send({ seed: 5, timeLimitSeconds: 6 });
  expect(enqueued.status).toBe(202);
  const planId = planResponseSchema.parse(enqueued.body).plan.id;
  const readPlan = async (): Promise<Plan | null> => {
    const res = await planner('get', `/api/plans/${planId}`);
    return res.status === 200 ? planResponseSchema.parse(res.body).plan : null;
  };
  await waitFor(readPlan, (plan) => plan?.status === 'running', 60_000);

  const to = `restart.${ctx.prefix}@test.example`;
  const subjects = Array.from({ length: 6 }, (_, i) => `Database restart check ${i + 1}`);
  for (const subject of subjects) await background.jobs.sendMail({ to: [to], subject, text: 'One copy only.' });

  cluster.stopFast();
  const during = await planner('get', `/api/plans/${planId}`);
  expect([during.status, during.body.error?.code]).toEqual([503, 'DATABASE_UNAVAILABLE']);
  expect(Number(during.headers['retry-after'])).toBeGreaterThan(0);
  const readyDuring = await request(app).get('/api/ready');
  expect(readyDuring.status).toBe(503);
  expect(readyDuring.body.problems[0]).toMatch(/^Database: /);
  expect((await request(app).get('/api/health')).status).toBe(200);
  cluster.start();

  // Service resumes by itself: same app, same pools, no restart.
  await waitFor(async () => (await request(app).get('/api/ready')).status, (status) => status === 200, 60_000);
  const plan = await waitFor(readPlan, (p) => p !== null && !['queued', 'running'].includes(p.status), 90_000);
  expect(plan?.status).toBe('done');
  expect(plan?.review?.totals.unresolved).toBe(0);

  // Every mail job has completed (none left to retry, none dead), and the sink holds one copy of each.
  const states = await waitFor(mailJobStates, (s) => s.completed === subjects.length && Object.keys(s).length === 1, 90_000);
  expect(states).toEqual({ completed: subjects.length });
  const received = (await readSinkMessages(ctx.db, { to })).map((m) => m.subject).sort();
  expect(received).toEqual([...subjects].sort());
});
