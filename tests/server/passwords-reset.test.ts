// Forgotten passwords against PostgreSQL: one answer for known and unknown addresses, a mailed link that works
// once and for 1 hour, a new password that ends every session, no mail for deactivated people, a request limit,
// and audit rows that never hold a token or a password.
import { randomUUID } from 'node:crypto';
import { and, eq, like, sql } from 'drizzle-orm';
import type express from 'express';
import request from 'supertest';
import { auditLog, oneTimeLinks, signInFailures, users } from '../../db/schema';
import type { JobQueue, MailJob } from '../../server/jobs/queue';
import { FORGOT_PASSWORD_ANSWER } from '../../shared/passwords';
import { signInAs } from './helpers/sign-in';
import { insertUser, setupTestApp, TEST_PASSWORD, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());
// The request limit counts per client address too, and every request here comes from the loopback address: each
// test starts with no reset requests counted (no other test file asks for reset links).
beforeEach(async () => {
  await ctx.db.delete(signInFailures).where(like(signInFailures.key, 'reset:%'));
});

const NEW_PASSWORD = 'tidal fern oyster lantern';
const HOUR_MS = 60 * 60 * 1000;

function mailCatcher(hold = false): { jobs: JobQueue; sent: MailJob[] } {
  const sent: MailJob[] = [];
  const jobs: JobQueue = {
    sendPlanRun: () => Promise.reject(new Error('no plan runs here')),
    cancelPlanRun: () => Promise.reject(new Error('no plan runs here')),
    // `hold`: the queue never answers, as if it hung; the request must not wait for it.
    sendMail: (job) => { sent.push(job); return hold ? new Promise<string>(() => undefined) : Promise.resolve(`job-${sent.length}`); },
  };
  return { jobs, sent };
}

async function freshUser(): Promise<{ id: string; email: string }> {
  const id = `${ctx.prefix}-${randomUUID().slice(0, 8)}`;
  const email = `${id}@test.example`;
  await insertUser(ctx.db, { id, email, name: `Rowan ${id}`, roles: ['planner'] });
  return { id, email };
}

/** The reset work runs after the answer: wait for its audit row (polled; no timing is asserted). */
async function requestRecorded(email: string): Promise<{ mailed: boolean }> {
  for (let i = 0; i < 250; i += 1) {
    const rows = await ctx.db.select({ after: auditLog.after }).from(auditLog)
      .where(and(eq(auditLog.action, 'password-reset-requested'), sql`${auditLog.after}->>'email' = ${email.toLowerCase()}`));
    if (rows.length > 0) return rows[rows.length - 1].after as { mailed: boolean };
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  throw new Error(`no reset request recorded for ${email}`);
}

const tokenIn = (mail: MailJob) => /reset-password\?token=([A-Za-z0-9_-]{43})/.exec(mail.text)?.[1] ?? '';
const forgot = (app: express.Application, email: string) => request(app).post('/api/auth/forgot-password').send({ email });
const me = (cookie: string) => request(ctx.app).get('/api/me').set('Cookie', cookie);

async function mailedToken(email: string): Promise<string> {
  const { jobs, sent } = mailCatcher();
  const res = await forgot(ctx.makeApp({ jobs }), email);
  expect(res.status).toBe(202);
  expect(await requestRecorded(email)).toMatchObject({ mailed: true });
  return tokenIn(sent[sent.length - 1]);
}

describe('asking for a link', () => {
  test('known and unknown addresses get the same status and body; only the known one is mailed a link', async () => {
    const { email } = await freshUser();
    const unknown = `nobody-${randomUUID().slice(0, 8)}@test.example`;
    const { jobs, sent } = mailCatcher();
    const app = ctx.makeApp({ jobs });
    const known = await forgot(app, email);
    const other = await forgot(app, unknown);
    expect([known.status, known.body]).toEqual([202, { message: FORGOT_PASSWORD_ANSWER }]);
    expect([other.status, other.body]).toEqual([known.status, known.body]);
    expect(other.headers['content-type']).toBe(known.headers['content-type']);
    expect(await requestRecorded(email)).toMatchObject({ mailed: true });
    expect(await requestRecorded(unknown)).toMatchObject({ mailed: false });
    expect(sent.map((m) => m.to)).toEqual([[email]]);
    expect(sent[0].text).toMatch(/works once, for 60 minutes/);
    // Only the token's hash is stored.
    const token = tokenIn(sent[0]);
    const stored = await ctx.db.select().from(oneTimeLinks).where(eq(oneTimeLinks.email, email));
    expect(stored).toHaveLength(1);
    expect(stored[0].kind).toBe('reset');
    expect(JSON.stringify(stored)).not.toContain(token);
  });

  test('the answer does not wait for the mail queue: a queue that never answers still gets 202', async () => {
    const { email } = await freshUser();
    const { jobs, sent } = mailCatcher(true);
    const res = await forgot(ctx.makeApp({ jobs }), email);
    expect(res.status).toBe(202);
    expect(await requestRecorded(email)).toMatchObject({ mailed: true });
    expect(sent).toHaveLength(1);
  });

  test('a deactivated person gets no mail, and the same answer', async () => {
    const { id, email } = await freshUser();
    await ctx.db.update(users).set({ deactivatedAt: new Date() }).where(eq(users.id, id));
    const { jobs, sent } = mailCatcher();
    const res = await forgot(ctx.makeApp({ jobs }), email);
    expect([res.status, res.body]).toEqual([202, { message: FORGOT_PASSWORD_ANSWER }]);
    expect(await requestRecorded(email)).toMatchObject({ mailed: false });
    expect(sent).toEqual([]);
  });

  test('the fourth request within an hour is refused alike for known and unknown addresses', async () => {
    const { email } = await freshUser();
    const unknown = `nobody-${randomUUID().slice(0, 8)}@test.example`;
    const app = ctx.makeApp({ jobs: mailCatcher().jobs });
    for (const address of [email, unknown]) {
      for (let i = 0; i < 3; i += 1) expect((await forgot(app, address)).status).toBe(202);
    }
    const [a, b] = [await forgot(app, email), await forgot(app, unknown)];
    expect([a.status, a.body.error.code]).toEqual([429, 'RATE_LIMITED']);
    expect([b.status, b.body]).toEqual([a.status, a.body]);
    expect(Number(a.headers['retry-after'])).toBeGreaterThan(0);
    expect(a.body.error.message).toMatch(/reset links/);
  });

  test('a malformed address is a clear 400', async () => {
    const res = await forgot(ctx.app, 'not-an-address');
    expect([res.status, res.body.error.code]).toEqual([400, 'VALIDATION_FAILED']);
  });
});

describe('using the link', () => {
  test('a weak password is refused with feedback and leaves the link working; a good one ends every session', async () => {
    const { id, email } = await freshUser();
    const [laptop, phone] = [await signInAs(ctx.app, email), await signInAs(ctx.app, email)];
    const token = await mailedToken(email);
    expect((await request(ctx.app).get(`/api/auth/reset-password/${token}`)).body).toEqual({ valid: true });

    const weak = await request(ctx.app).post('/api/auth/reset-password').send({ token, password: 'password1234' });
    expect([weak.status, weak.body.error.code]).toEqual([400, 'WEAK_PASSWORD']);
    expect(weak.body.error.message).toMatch(/commonly used password/);
    expect((await request(ctx.app).get(`/api/auth/reset-password/${token}`)).status).toBe(200);
    expect((await me(laptop)).status).toBe(200);

    const done = await request(ctx.app).post('/api/auth/reset-password').send({ token, password: NEW_PASSWORD });
    expect(done.status).toBe(204);
    expect([(await me(laptop)).status, (await me(phone)).status]).toEqual([401, 401]);
    const old = await request(ctx.app).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD });
    expect(old.status).toBe(401);
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email, password: NEW_PASSWORD })).status).toBe(200);

    // Audit: the request and the reset, with neither the token nor either password.
    const rows = await ctx.db.select().from(auditLog).where(eq(auditLog.entityId, id));
    expect(rows.map((r) => r.action)).toEqual(expect.arrayContaining(['password-reset-requested', 'password-reset']));
    expect(rows.find((r) => r.action === 'password-reset')?.after).toEqual({ sessionsEnded: 2 });
    const text = JSON.stringify(rows);
    for (const secret of [token, NEW_PASSWORD, 'password1234', TEST_PASSWORD]) expect(text).not.toContain(secret);
  });

  test('a link works once', async () => {
    const { email } = await freshUser();
    const token = await mailedToken(email);
    expect((await request(ctx.app).post('/api/auth/reset-password').send({ token, password: NEW_PASSWORD })).status).toBe(204);
    const again = await request(ctx.app).post('/api/auth/reset-password').send({ token, password: `${NEW_PASSWORD} again` });
    expect([again.status, again.body.error.code]).toEqual([404, 'RESET_LINK_INVALID']);
    expect((await request(ctx.app).get(`/api/auth/reset-password/${token}`)).status).toBe(404);
  });

  test('a link stops working after 1 hour', async () => {
    const { email } = await freshUser();
    const token = await mailedToken(email);
    const later = ctx.makeApp({ now: () => new Date(Date.now() + HOUR_MS + 60_000) });
    expect((await request(later).get(`/api/auth/reset-password/${token}`)).status).toBe(404);
    const res = await request(later).post('/api/auth/reset-password').send({ token, password: NEW_PASSWORD });
    expect([res.status, res.body.error.code]).toEqual([404, 'RESET_LINK_INVALID']);
    const before = ctx.makeApp({ now: () => new Date(Date.now() + HOUR_MS - 60_000) });
    expect((await request(before).get(`/api/auth/reset-password/${token}`)).status).toBe(200);
  });

  test('a newer link replaces the older one', async () => {
    const { email } = await freshUser();
    const first = await mailedToken(email);
    const { jobs, sent } = mailCatcher();
    // A second request at a later moment (the audit poll finds the newer row by its count).
    await forgot(ctx.makeApp({ jobs }), email);
    for (let i = 0; i < 250 && sent.length === 0; i += 1) await new Promise((resolve) => setTimeout(resolve, 20));
    const second = tokenIn(sent[0]);
    expect((await request(ctx.app).get(`/api/auth/reset-password/${first}`)).status).toBe(404);
    expect((await request(ctx.app).get(`/api/auth/reset-password/${second}`)).status).toBe(200);
  });

  test('a link of a person deactivated since it was mailed no longer works', async () => {
    const { id, email } = await freshUser();
    const token = await mailedToken(email);
    await ctx.db.update(users).set({ deactivatedAt: new Date() }).where(eq(users.id, id));
    const res = await request(ctx.app).post('/api/auth/reset-password').send({ token, password: NEW_PASSWORD });
    expect(res.status).toBe(404);
  });

  test('made-up and malformed tokens get the same 404', async () => {
    for (const token of ['A'.repeat(43), 'short']) {
      const res = await request(ctx.app).get(`/api/auth/reset-password/${token}`);
      expect([res.status, res.body.error.code]).toEqual([404, 'RESET_LINK_INVALID']);
    }
  });
});
