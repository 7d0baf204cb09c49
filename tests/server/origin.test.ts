// Origin / Sec-Fetch-Site check on state-changing requests.
import request from 'supertest';
import { setupTestApp, TEST_PASSWORD, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const signIn = () => request(ctx.app).post('/api/auth/sign-in').send({ email: ctx.users.admin.email, password: TEST_PASSWORD });

test('a cross-site POST (Origin https://evil.example) is refused with 403 BAD_ORIGIN', async () => {
  const res = await signIn().set('Origin', 'https://evil.example');
  expect(res.status).toBe(403);
  expect(res.body).toEqual({ error: { code: 'BAD_ORIGIN', message: expect.any(String) } });
  expect(res.headers['set-cookie']).toBeUndefined();
});

test('a same-origin POST is allowed', async () => {
  const res = await signIn().set('Host', 'slackwater.example').set('Origin', 'https://slackwater.example');
  expect(res.status).toBe(200);
});

test('a POST without Origin or Sec-Fetch-Site (curl, scripts) is allowed', async () => {
  expect((await signIn()).status).toBe(200);
});

test.each(['cross-site', 'same-site'])('Sec-Fetch-Site: %s without Origin is refused', async (site) => {
  const res = await signIn().set('Sec-Fetch-Site', site);
  expect(res.status).toBe(403);
  expect(res.body.error.code).toBe('BAD_ORIGIN');
});

test('Sec-Fetch-Site: same-origin is allowed', async () => {
  expect((await signIn().set('Sec-Fetch-Site', 'same-origin')).status).toBe(200);
});

test('the opaque origin "null" is refused', async () => {
  expect((await signIn().set('Origin', 'null')).status).toBe(403);
});

test('an origin listed in ALLOWED_ORIGINS (the dev server) is allowed', async () => {
  const app = ctx.makeApp({ config: { ...ctx.config, allowedOrigins: ['http://localhost:8081'] } });
  const res = await request(app).post('/api/auth/sign-in').set('Origin', 'http://localhost:8081')
    .send({ email: ctx.users.admin.email, password: TEST_PASSWORD });
  expect(res.status).toBe(200);
});

test('a cross-site GET is not blocked (reads change nothing)', async () => {
  const res = await request(ctx.app).get('/api/health').set('Origin', 'https://evil.example');
  expect(res.status).toBe(200);
});
