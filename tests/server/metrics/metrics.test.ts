// GET /metrics: the Prometheus text format parses, the request counters move with requests, and access follows
// METRICS_ACCESS (loopback only by default, a bearer token, or open).
import express from 'express';
import request from 'supertest';
import { createApp } from '../../../server/app';
import { signInAs } from '../helpers/sign-in';
import { setupTestApp, testConfig, type TestContext } from '../helpers/test-app';
import { QUEUES } from '../../../server/jobs/queue';
import { startMailTestBoss } from '../mail/test-boss';
import { parsePrometheusText, type Samples } from './prometheus-text';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const TOKEN = 'a'.repeat(24) + 'b'.repeat(24);

async function scrape(app: express.Application): Promise<Samples> {
  const res = await request(app).get('/metrics');
  expect(res.status).toBe(200);
  return parsePrometheusText(res.text);
}

/** `app` as a client at `address` would reach it (supertest always connects from loopback). */
function fromAddress(app: express.Application, address: string): express.Application {
  const outer = express();
  outer.use((req, _res, next) => {
    Object.defineProperty(req.socket, 'remoteAddress', { value: address, configurable: true });
    next();
  });
  outer.use(app);
  return outer;
}

const count = (s: Samples, route: string, status: number, method = 'GET') =>
  s.get(`slackwater_http_request_duration_seconds_count{method="${method}",route="${route}",status="${status}"}`) ?? 0;

test('the text format parses and carries process, pool and database figures', async () => {
  const res = await request(ctx.app).get('/metrics');
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/^text\/plain; version=0\.0\.4/);
  expect(res.headers['cache-control']).toBe('no-store');
  const samples = parsePrometheusText(res.text);
  expect(samples.get('process_cpu_user_seconds_total')).toBeGreaterThan(0);
  expect(samples.get('slackwater_database_reachable')).toBe(1);
  expect(samples.get('slackwater_db_pool_connections{state="idle"}')).toBeGreaterThanOrEqual(0);
  expect(samples.get('slackwater_db_pool_connections{state="in_use"}')).toBeGreaterThanOrEqual(0);
  expect(samples.get('slackwater_db_pool_waiting_requests')).toBe(0);
});

test('request counts and durations move by route pattern and status', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.planner.email);
  const before = await scrape(ctx.app);
  for (let i = 0; i < 3; i += 1) expect((await request(ctx.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
  expect((await request(ctx.app).get('/api/me')).status).toBe(401);
  expect((await request(ctx.app).get(`/api/no-such-route/${ctx.prefix}`)).status).toBe(404);
  // A refusal raised inside a nested router still counts under the route's full pattern.
  expect((await request(ctx.app).get(`/api/windows/${ctx.prefix}-missing`).set('Cookie', cookie)).status).toBe(404);
  const after = await scrape(ctx.app);
  expect(count(after, '/api/me', 200) - count(before, '/api/me', 200)).toBe(3);
  expect(count(after, '/api/me', 401) - count(before, '/api/me', 401)).toBe(1);
  expect(count(after, '(no route)', 404) - count(before, '(no route)', 404)).toBe(1);
  expect(count(after, '/api/windows/:id', 404) - count(before, '/api/windows/:id', 404)).toBe(1);
  // The URL's values never become labels.
  expect([...after.keys()].filter((k) => k.includes(ctx.prefix))).toEqual([]);
  const sumBefore = before.get('slackwater_http_request_duration_seconds_sum{method="GET",route="/api/me",status="200"}') ?? 0;
  expect(after.get('slackwater_http_request_duration_seconds_sum{method="GET",route="/api/me",status="200"}')).toBeGreaterThan(sumBefore);
  // The +Inf bucket of a histogram holds every observation.
  expect(after.get('slackwater_http_request_duration_seconds_bucket{le="+Inf",method="GET",route="/api/me",status="200"}'))
    .toBe(count(after, '/api/me', 200));
});

describe('access', () => {
  test('loopback (the default): refused for another address and for a request that came through a proxy', async () => {
    expect(ctx.config.metrics).toEqual({ mode: 'loopback', token: null });
    const remote = await request(fromAddress(ctx.app, '203.0.113.7')).get('/metrics');
    expect([remote.status, remote.body.error?.code]).toEqual([403, 'METRICS_LOOPBACK_ONLY']);
    expect(remote.text).not.toContain('slackwater_');
    const proxied = await request(ctx.app).get('/metrics').set('X-Forwarded-For', '203.0.113.7');
    expect([proxied.status, proxied.body.error?.code]).toEqual([403, 'METRICS_LOOPBACK_ONLY']);
    expect((await request(fromAddress(ctx.app, '::ffff:127.0.0.1')).get('/metrics')).status).toBe(200);
    expect((await request(fromAddress(ctx.app, '::1')).get('/metrics')).status).toBe(200);
  });

  test('token: METRICS_TOKEN as a bearer token from anywhere; without it 401, even from loopback', async () => {
    const config = testConfig({ METRICS_TOKEN: TOKEN });
    expect(config.metrics.mode).toBe('token');
    const app = createApp({ db: ctx.db, pool: ctx.pool, config });
    const bare = await request(app).get('/metrics');
    expect([bare.status, bare.body.error?.code, bare.headers['www-authenticate']]).toEqual([401, 'METRICS_TOKEN_REQUIRED', 'Bearer realm="metrics"']);
    expect((await request(app).get('/metrics').set('Authorization', `Bearer ${TOKEN}x`)).status).toBe(401);
    expect((await request(app).get('/metrics').set('Authorization', `Basic ${TOKEN}`)).status).toBe(401);
    const remote = await request(fromAddress(app, '203.0.113.7')).get('/metrics').set('Authorization', `Bearer ${TOKEN}`);
    expect(remote.status).toBe(200);
    expect(parsePrometheusText(remote.text).has('slackwater_database_reachable')).toBe(true);
  });

  test('open: anyone may read', async () => {
    const app = createApp({ db: ctx.db, pool: ctx.pool, config: testConfig({ METRICS_ACCESS: 'open' }) });
    expect((await request(fromAddress(app, '203.0.113.7')).get('/metrics')).status).toBe(200);
  });

  test('token mode without a token, or a short token, is a configuration error', () => {
    expect(() => testConfig({ METRICS_ACCESS: 'token' })).toThrow(/METRICS_TOKEN: required when METRICS_ACCESS=token/);
    expect(() => testConfig({ METRICS_TOKEN: 'short' })).toThrow(/METRICS_TOKEN/);
    expect(testConfig({ METRICS_TOKEN: TOKEN, METRICS_ACCESS: 'loopback' }).metrics.mode).toBe('loopback');
  });
});

test('an unreachable database shows as slackwater_database_reachable 0, and the scrape still answers', async () => {
  const { createDb } = await import('../../../db/client');
  const broken = createDb('postgres://postgres@127.0.0.1:1/nowhere', { max: 1 });
  try {
    const app = createApp({ db: broken.db, pool: broken.pool, config: testConfig() });
    const samples = await scrape(app);
    expect(samples.get('slackwater_database_reachable')).toBe(0);
  } finally {
    await broken.pool.end();
  }
});

test('queue depth: waiting jobs per queue, read from the job tables of JOB_SCHEMA', async () => {
  const queue = await startMailTestBoss(0);
  try {
    const app = createApp({ db: ctx.db, pool: ctx.pool, config: testConfig({ JOB_SCHEMA: queue.schema }) });
    expect((await scrape(app)).get(`slackwater_job_queue_jobs{queue="${QUEUES.mail}",state="waiting"}`)).toBeUndefined();
    for (const subject of ['one', 'two']) await queue.boss.send(QUEUES.mail, { to: 'x@test.example', subject, text: subject });
    const samples = await scrape(app);
    expect(samples.get(`slackwater_job_queue_jobs{queue="${QUEUES.mail}",state="waiting"}`)).toBe(2);
    expect(samples.get('slackwater_database_reachable')).toBe(1);
  } finally {
    await queue.stop();
  }
});
