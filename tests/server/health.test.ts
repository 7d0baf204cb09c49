// GET /api/health against the real test database, and against a pool that cannot connect.
import request from 'supertest';
import { createDb } from '../../db/client';
import { createApp } from '../../server/app';
import { setupTestApp, testConfig, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

test('health answers 200 {"ok":true,"db":true} when the database answers', async () => {
  const res = await request(ctx.app).get('/api/health');
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ ok: true, db: true });
  expect(res.headers['cache-control']).toBe('no-store');
});

test('health answers 503 {"ok":false,"db":false} when the database is unreachable', async () => {
  // Port 1 on loopback: nothing listens there, so every connection is refused.
  const broken = createDb('postgres://postgres@127.0.0.1:1/nowhere', { max: 1 });
  try {
    const app = createApp({ db: broken.db, pool: broken.pool, config: testConfig() });
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ ok: false, db: false });
  } finally {
    await broken.pool.end();
  }
});
