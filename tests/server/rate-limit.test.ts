// Sign-in rate limiting per IP and e-mail: failed attempts count, the limit answers 429 in the error shape.
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
  const app = ctx.makeApp({ signInLimit: { windowMs: 60_000, max: 3 } });
  const email = ctx.users.engineer.email;
  for (let i = 0; i < 3; i += 1) expect((await attempt(app, email, 'wrong')).status).toBe(401);
  const limited = await attempt(app, email, TEST_PASSWORD);
  expect(limited.status).toBe(429);
  expect(limited.body).toEqual({ error: { code: 'RATE_LIMITED', message: expect.any(String) } });
  // Keyed by e-mail too: another account from the same address is not locked out.
  expect((await attempt(app, ctx.users.planner.email, TEST_PASSWORD)).status).toBe(200);
});

test('successful sign-ins do not use up the limit', async () => {
  const app = ctx.makeApp({ signInLimit: { windowMs: 60_000, max: 2 } });
  for (let i = 0; i < 4; i += 1) expect((await attempt(app, ctx.users.admin.email, TEST_PASSWORD)).status).toBe(200);
});
