// GET /api/health (liveness: no database) and GET /api/ready (readiness: a real query, the job queue, migrations),
// against the real test database and against a pool that cannot connect.
import request from 'supertest';
import { createDb } from '../../db/client';
import { readCommittedMigrations } from '../../db/migrate';
import { createApp } from '../../server/app';
import { readinessSchema } from '../../shared/readiness';
import { createRecordingQueue } from './helpers/jobs';
import { setupTestApp, testConfig, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

/** Port 1 on loopback: nothing listens there, so every connection is refused. */
function unreachableApp() {
  const broken = createDb('postgres://postgres@127.0.0.1:1/nowhere', { max: 1 });
  return { app: createApp({ db: broken.db, pool: broken.pool, config: testConfig(), jobs: createRecordingQueue() }), close: () => broken.pool.end() };
}

test('health answers 200 {"ok":true} without asking the database', async () => {
  const res = await request(ctx.app).get('/api/health');
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ ok: true });
  expect(res.headers['cache-control']).toBe('no-store');
});

test('health still answers 200 while the database is unreachable: the process is alive', async () => {
  const broken = unreachableApp();
  try {
    const res = await request(broken.app).get('/api/health');
    expect([res.status, res.body]).toEqual([200, { ok: true }]);
  } finally {
    await broken.close();
  }
});

test('ready answers 200 when the database answers, the queue runs and every committed migration is applied', async () => {
  const res = await request(ctx.makeApp({ jobs: createRecordingQueue() })).get('/api/ready');
  expect(res.status).toBe(200);
  const body = readinessSchema.parse(res.body);
  expect(body.ready).toBe(true);
  expect(body.problems).toEqual([]);
  expect(body.checks.migrations.detail).toBe(`all ${readCommittedMigrations().length} applied`);
  expect(res.headers['cache-control']).toBe('no-store');
});

test('ready answers 503 naming the job queue when it is not running', async () => {
  const stoppedQueue = Object.assign(createRecordingQueue(), { failing: true });
  const res = await request(ctx.makeApp({ jobs: stoppedQueue })).get('/api/ready');
  expect(res.status).toBe(503);
  const body = readinessSchema.parse(res.body);
  expect(body.checks.database.ok).toBe(true);
  expect(body.checks.jobQueue).toEqual({ ok: false, detail: 'not running' });
  expect(body.problems).toEqual(['Job queue: not running']);
});

test('ready answers 503 naming the database (and migrations unchecked) when it is unreachable', async () => {
  const broken = unreachableApp();
  try {
    const res = await request(broken.app).get('/api/ready');
    expect(res.status).toBe(503);
    const body = readinessSchema.parse(res.body);
    expect(body.ready).toBe(false);
    expect(body.checks.database).toEqual({ ok: false, detail: 'cannot be reached (ECONNREFUSED)' });
    expect(body.checks.migrations.ok).toBe(false);
    expect(body.problems).toHaveLength(2);
  } finally {
    await broken.close();
  }
});
