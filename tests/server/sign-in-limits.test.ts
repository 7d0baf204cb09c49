// Sign-in limits kept in PostgreSQL: per address across many accounts, shared by app instances, exact under
// parallel attempts, with Retry-After. Supertest always connects from loopback and `trust proxy` is off, so the
// per-address cases call the service with an address of their own.
import { randomInt } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { createDb } from '../../db/client';
import { signInFailures } from '../../db/schema';
import { createApp } from '../../server/app';
import { signIn } from '../../server/auth/sign-in';
import type { SignInLimit } from '../../server/auth/sign-in-limit';
import { SignInLimitedError } from '../../server/auth/sign-in-limit-error';
import { BadCredentialsError } from '../../server/errors';
import { setupTestApp, TEST_PASSWORD, testDatabaseUrl, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const FIFTEEN_MINUTES_MS = 15 * 60 * 1000;
const defaults: SignInLimit = { windowMs: FIFTEEN_MINUTES_MS, perAccount: 5, perAddress: 20 };
/** A random private (RFC 1918) address, so runs and files do not share one. */
const freshAddress = () => `10.${randomInt(256)}.${randomInt(256)}.${randomInt(256)}`;
const unknownEmail = (n: number) => `nobody${n}.${ctx.prefix}.${randomInt(1e9)}@test.example`;

type Outcome = 'ok' | 'bad' | 'account-limit' | 'address-limit';
async function outcomeOf(attempt: Promise<unknown>): Promise<Outcome> {
  try {
    await attempt;
    return 'ok';
  } catch (err) {
    if (err instanceof BadCredentialsError) return 'bad';
    if (err instanceof SignInLimitedError) return err.limitKind === 'account' ? 'account-limit' : 'address-limit';
    throw err;
  }
}
const tryAs = (email: string, password: string, address: string, limit = defaults, now = new Date()) =>
  outcomeOf(signIn(ctx.db, { email, password, address, now, limit }));

test('40 accounts from one address: 20 wrong passwords are checked, then the address is refused', async () => {
  const address = freshAddress();
  const outcomes: Outcome[] = [];
  for (let i = 0; i < 40; i += 1) outcomes.push(await tryAs(unknownEmail(i), 'wrong', address));
  expect(outcomes.slice(0, 20)).toEqual(Array(20).fill('bad'));
  expect(outcomes.slice(20)).toEqual(Array(20).fill('address-limit'));
  // Even the right password is refused from that address; from another address it works.
  expect(await tryAs(ctx.users.engineer.email, TEST_PASSWORD, address)).toBe('address-limit');
  expect(await tryAs(ctx.users.engineer.email, TEST_PASSWORD, freshAddress())).toBe('ok');
});

test('a successful sign-in neither counts nor resets the address count', async () => {
  const address = freshAddress();
  const limit = { ...defaults, perAddress: 3 };
  expect(await tryAs(unknownEmail(1), 'wrong', address, limit)).toBe('bad');
  expect(await tryAs(unknownEmail(2), 'wrong', address, limit)).toBe('bad');
  expect(await tryAs(ctx.users.planner.email, TEST_PASSWORD, address, limit)).toBe('ok');
  expect(await tryAs(unknownEmail(3), 'wrong', address, limit)).toBe('bad');
  expect(await tryAs(unknownEmail(4), 'wrong', address, limit)).toBe('address-limit');
});

test('parallel wrong sign-ins for one account: exactly the limit is checked, the rest are refused', async () => {
  const email = unknownEmail(0);
  const outcomes = await Promise.all(Array.from({ length: 12 }, () => tryAs(email, 'wrong', freshAddress(), { ...defaults, perAccount: 4 })));
  expect(outcomes.filter((o) => o === 'bad')).toHaveLength(4);
  expect(outcomes.filter((o) => o === 'account-limit')).toHaveLength(8);
  const rows = await ctx.db.select().from(signInFailures)
    .where(and(eq(signInFailures.keyKind, 'account'), eq(signInFailures.key, email)));
  expect(rows).toHaveLength(4);
});

test('Retry-After counts from the oldest failure that still fills the window', async () => {
  const email = unknownEmail(0);
  const address = freshAddress();
  const limit = { windowMs: 60_000, perAccount: 3, perAddress: 100 };
  const t0 = Date.now();
  for (let s = 0; s < 3; s += 1) expect(await tryAs(email, 'wrong', address, limit, new Date(t0 + s * 1000))).toBe('bad');
  const refused = signIn(ctx.db, { email, password: 'wrong', address, now: new Date(t0 + 10_000), limit });
  await expect(refused).rejects.toMatchObject({ code: 'RATE_LIMITED', status: 429, retryAfterSeconds: 50 });
  // Once the first failure has left the window, one more attempt is checked.
  expect(await tryAs(email, 'wrong', address, limit, new Date(t0 + 60_001))).toBe('bad');
});

test('the count survives a new app instance on its own connection pool (as after a restart)', async () => {
  const limit = { windowMs: 60_000, perAccount: 2, perAddress: 1000 };
  const email = ctx.users.approver.email;
  const first = ctx.makeApp({ signInLimit: limit });
  for (let i = 0; i < 2; i += 1) {
    expect((await request(first).post('/api/auth/sign-in').send({ email, password: 'wrong' })).status).toBe(401);
  }
  const other = createDb(testDatabaseUrl(), { max: 2 });
  try {
    const second = createApp({ db: other.db, pool: other.pool, config: ctx.config, signInLimit: limit });
    const res = await request(second).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('RATE_LIMITED');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  } finally {
    await other.pool.end();
  }
});
