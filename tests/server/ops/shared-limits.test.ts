// Limits are counted in PostgreSQL, never in one process: two API instances on connection pools of their own, behind
// one proxy (TRUST_PROXY), count a client's failed sign-ins, reset-link requests and link checks together.
import { randomInt, randomUUID } from 'node:crypto';
import type express from 'express';
import request from 'supertest';
import { createDb } from '../../../db/client';
import { createApp } from '../../../server/app';
import { createRecordingQueue } from '../helpers/jobs';
import { setupTestApp, testConfig, testDatabaseUrl, type TestContext } from '../helpers/test-app';

let ctx: TestContext;
let other: ReturnType<typeof createDb>;
let first: express.Application;
let second: express.Application;
/** Three tries per client address a minute, so that the fourth is refused whichever instance it reaches. */
const LIMIT = { windowMs: 60_000, perAccount: 1000, perAddress: 3 };

beforeAll(async () => {
  ctx = await setupTestApp();
  other = createDb(testDatabaseUrl(), { max: 2 });
  const config = testConfig({ TRUST_PROXY: 'loopback' });
  first = createApp({ db: ctx.db, pool: ctx.pool, config, signInLimit: LIMIT, jobs: createRecordingQueue() });
  second = createApp({ db: other.db, pool: other.pool, config, signInLimit: LIMIT, jobs: createRecordingQueue() });
});
afterAll(async () => {
  await other?.pool.end();
  await ctx?.close();
});

/** A client address of this test alone (as the proxy forwards it), so no other test's attempts count against it. */
const clientAddress = () => `10.${randomInt(256)}.${randomInt(256)}.${randomInt(1, 255)}`;
const nobody = () => `nobody-${randomUUID().slice(0, 8)}@limits.test`;

test('failed sign-ins from one client address count on both instances', async () => {
  const address = clientAddress();
  const signIn = (app: express.Application, from: string) =>
    request(app).post('/api/auth/sign-in').set('X-Forwarded-For', from).send({ email: nobody(), password: 'not-the-password' });
  for (const app of [first, second, first]) expect((await signIn(app, address)).status).toBe(401);
  const refused = await signIn(second, address);
  expect([refused.status, refused.body.error.code]).toEqual([429, 'RATE_LIMITED']);
  // Keyed by the forwarded address, not the proxy's own: another client through the same proxy is still checked.
  expect((await signIn(second, clientAddress())).status).toBe(401);
});

test('reset-link requests for one e-mail address count on both instances', async () => {
  const email = nobody();
  const forgot = (app: express.Application) =>
    request(app).post('/api/auth/forgot-password').set('X-Forwarded-For', clientAddress()).send({ email });
  // Three an hour per e-mail address (RESET_REQUEST_LIMIT), each from another client address.
  for (const app of [first, second, first]) expect((await forgot(app)).status).toBe(202);
  const refused = await forgot(second);
  expect([refused.status, refused.body.error.code]).toEqual([429, 'RATE_LIMITED']);
  expect(refused.body.error.message).toMatch(/reset links/);
});

test('made-up reset links opened from one client address count on both instances', async () => {
  const address = clientAddress();
  const open = (app: express.Application) =>
    request(app).get(`/api/auth/reset-password/${'x'.repeat(43)}`).set('X-Forwarded-For', address);
  for (const app of [first, second, first]) expect((await open(app)).status).toBe(404);
  const refused = await open(second);
  expect([refused.status, refused.body.error.code]).toEqual([429, 'RATE_LIMITED']);
});
