// Sign-in limit per account over HTTP: failed attempts count, the limit answers 429 in the error shape.
// (Per-address limits, persistence and parallel attempts: sign-in-limits.test.ts.)
import request from 'supertest';
import { setupTestApp, TEST_PASSWORD, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const attempt = (app: ReturnType<TestContext['makeApp']>, email: string, password: string) =>
  request(app).post('/api/auth/sign-in').send({ email, password });

test('after max failed attempts the next one gets 429 RATE_LIMITED, even with the right password', async () => {
  const app = ctx.makeApp({ signInLimit: { windowMs: 60_000, perAccount: 3, perAddress: 1000 } });
  const email = ctx.users.engineer.email;
  for (let i = 0; i < 3; i += 1) expect((await attempt(app, email, 'wrong')).status).toBe(401);
  const limited = await attempt(app, email, TEST_PASSWORD);
  expect(limited.status).toBe(429);
  expect(limited.body).toEqual({ error: { code: 'RATE_LIMITED', message: expect.stringMatching(/e-mail address/) } });
  const retryAfterSeconds = Number(limited.headers['retry-after']);
  expect(retryAfterSeconds).toBeGreaterThan(0);
  expect(retryAfterSeconds).toBeLessThanOrEqual(60);
  // Keyed by e-mail: another account from the same address is not locked out.
  expect((await attempt(app, ctx.users.planner.email, TEST_PASSWORD)).status).toBe(200);
});

test('successful sign-ins do not use up the limit', async () => {
  const app = ctx.makeApp({ signInLimit: { windowMs: 60_000, perAccount: 2, perAddress: 1000 } });
  for (let i = 0; i < 4; i += 1) expect((await attempt(app, ctx.users.admin.email, TEST_PASSWORD)).status).toBe(200);
});
