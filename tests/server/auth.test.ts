// Sign-in, sign-out and /api/me through the API contract, plus the audit rows they write.
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { auditLog, sessions } from '../../db/schema';
import { apiErrorSchema, meSchema, signInResponseSchema } from '../../shared/api';
import { NETWORK_TIME_ZONE } from '../../shared/time-zone';
import { signInAs } from './helpers/sign-in';
import { sessionCookieFrom, sessionSetCookie, setupTestApp, TEST_PASSWORD, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

describe('POST /api/auth/sign-in', () => {
  test('right password: 200 {user} and an HttpOnly, SameSite=Lax, Path=/ session cookie', async () => {
    const { tenant } = ctx.users;
    const res = await request(ctx.app).post('/api/auth/sign-in').send({ email: tenant.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    const body = signInResponseSchema.strict().parse(res.body);
    expect(body.user).toEqual({ id: tenant.id, email: tenant.email, name: `User ${tenant.id}`, roles: ['tenant'], tenantId: ctx.tenantId, timeZone: NETWORK_TIME_ZONE, timeZoneChosen: false });
    const cookie = sessionSetCookie(res)!;
    expect(cookie).toMatch(/^slackwater_session=[a-z2-7]{32}\.[a-z2-7]{32};/);
    expect(cookie).toMatch(/; HttpOnly/i);
    expect(cookie).toMatch(/; SameSite=Lax/i);
    expect(cookie).toMatch(/; Path=\//);
    // supertest talks to 127.0.0.1: a loopback host, so no Secure flag (plain http must work locally).
    expect(cookie).not.toMatch(/; Secure/i);
  });

  test('e-mail is matched without regard to case', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in')
      .send({ email: ctx.users.admin.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.id).toBe(ctx.users.admin.id);
  });

  test('outside loopback the cookie is Secure', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in').set('Host', 'slackwater.example')
      .send({ email: ctx.users.admin.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(sessionSetCookie(res)).toMatch(/; Secure/i);
  });

  test.each([
    ['a wrong password', () => ({ email: ctx.users.admin.email, password: 'not-the-password' })],
    ['an unknown e-mail', () => ({ email: `nobody.${ctx.prefix}@test.example`, password: TEST_PASSWORD })],
  ])('%s: 401 BAD_CREDENTIALS in the error shape, no cookie', async (_name, body) => {
    const res = await request(ctx.app).post('/api/auth/sign-in').send(body());
    expect(res.status).toBe(401);
    expect(apiErrorSchema.strict().parse(res.body).error.code).toBe('BAD_CREDENTIALS');
    expect(res.body.error.message.length).toBeGreaterThan(0);
    expect(sessionSetCookie(res)).toBeUndefined();
  });

  test('a body that is not {email,password}: 400 VALIDATION_FAILED naming the fields', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in').send({ email: 'not-an-address' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['$.email', '$.password']);
  });

  test('malformed JSON: 400 BAD_JSON in the error shape', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_JSON');
  });

  test('success and failure both leave an audit row', async () => {
    const { engineer } = ctx.users;
    await request(ctx.app).post('/api/auth/sign-in').send({ email: engineer.email, password: 'wrong' });
    await request(ctx.app).post('/api/auth/sign-in').send({ email: engineer.email, password: TEST_PASSWORD });
    const rows = await ctx.db.select({ action: auditLog.action, entity: auditLog.entity })
      .from(auditLog).where(eq(auditLog.actorId, engineer.id)).orderBy(auditLog.id);
    expect(rows).toEqual([{ action: 'sign-in-failed', entity: 'user' }, { action: 'sign-in', entity: 'session' }]);
  });
});

describe('GET /api/me', () => {
  test('with a session cookie: 200 with exactly id, email, name, roles, tenantId and the time zone', async () => {
    const cookie = await signInAs(ctx.app, ctx.users.planner.email);
    const res = await request(ctx.app).get('/api/me').set('Cookie', cookie);
    expect(res.status).toBe(200);
    expect(meSchema.strict().parse(res.body)).toEqual({
      id: ctx.users.planner.id, email: ctx.users.planner.email, name: `User ${ctx.users.planner.id}`, roles: ['planner'], tenantId: null,
      timeZone: NETWORK_TIME_ZONE, timeZoneChosen: false,
    });
  });

  test('without a session cookie: 401 UNAUTHENTICATED', async () => {
    const res = await request(ctx.app).get('/api/me');
    expect(res.status).toBe(401);
    expect(apiErrorSchema.strict().parse(res.body).error.code).toBe('UNAUTHENTICATED');
  });
});

describe('POST /api/auth/sign-out', () => {
  test('deletes the session, clears the cookie, writes an audit row; the old cookie no longer works', async () => {
    const { approver } = ctx.users;
    const signIn = await request(ctx.app).post('/api/auth/sign-in').send({ email: approver.email, password: TEST_PASSWORD });
    const cookie = sessionCookieFrom(signIn);
    const sessionId = cookie.split('=')[1].split('.')[0];
    const out = await request(ctx.app).post('/api/auth/sign-out').set('Cookie', cookie);
    expect(out.status).toBe(204);
    expect(sessionSetCookie(out)).toMatch(/^slackwater_session=;.*Expires=Thu, 01 Jan 1970/);
    expect(await ctx.db.select({ id: sessions.id }).from(sessions).where(eq(sessions.id, sessionId))).toEqual([]);
    const audit = await ctx.db.select({ id: auditLog.id }).from(auditLog)
      .where(and(eq(auditLog.action, 'sign-out'), eq(auditLog.entityId, sessionId)));
    expect(audit).toHaveLength(1);
    const me = await request(ctx.app).get('/api/me').set('Cookie', cookie);
    expect(me.status).toBe(401);
  });

  test('without a session it still answers 204', async () => {
    const res = await request(ctx.app).post('/api/auth/sign-out');
    expect(res.status).toBe(204);
  });
});
