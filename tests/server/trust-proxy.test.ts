// TRUST_PROXY: the client address a session records is the socket's unless the proxy in front is trusted; then it
// is the one the proxy forwards (X-Forwarded-For).
import request from 'supertest';
import { setupTestApp, testConfig, TEST_PASSWORD, sessionCookieFrom, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

/** Signs the engineer in with a forwarded address and returns the addresses of their sessions. */
async function sessionAddresses(trustProxy?: string): Promise<string> {
  const app = ctx.makeApp({ config: testConfig(trustProxy ? { TRUST_PROXY: trustProxy } : {}) });
  const signIn = await request(app).post('/api/auth/sign-in').set('X-Forwarded-For', '203.0.113.9')
    .send({ email: ctx.users.engineer.email, password: TEST_PASSWORD });
  expect(signIn.status).toBe(200);
  const res = await request(app).get('/api/me/sessions').set('Cookie', sessionCookieFrom(signIn));
  expect(res.status).toBe(200);
  return JSON.stringify(res.body);
}

test('off (the default): a forwarded address is ignored', async () => {
  expect(ctx.config.trustProxy).toBe(false);
  expect(await sessionAddresses()).not.toContain('203.0.113.9');
});

test('loopback: the address forwarded by a proxy on this machine is the client', async () => {
  expect(await sessionAddresses('loopback')).toContain('203.0.113.9');
});

test('TRUST_PROXY accepts off, loopback, hop counts and address lists, nothing else', () => {
  expect(testConfig({ TRUST_PROXY: '1' }).trustProxy).toBe(1);
  expect(testConfig({ TRUST_PROXY: '10.0.0.0/8, 192.0.2.7' }).trustProxy).toBe('10.0.0.0/8, 192.0.2.7');
  expect(() => testConfig({ TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY/);
});
