// Session validation: inactivity expiry, hourly refresh, tampered or malformed tokens — all end in 401.
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { sessions } from '../../db/schema';
import { SESSION_REFRESH_MS } from '../../server/auth/sessions';
import { generateSessionToken, hashSessionSecret, parseSessionToken, secretMatches } from '../../server/auth/session-token';
import { signInAs } from './helpers/sign-in';
import { sessionSetCookie, setupTestApp, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const sessionIdOf = (cookie: string) => cookie.split('=')[1].split('.')[0];
const appAt = (offsetMs: number) => ctx.makeApp({ now: () => new Date(Date.now() + offsetMs) });

describe('session tokens', () => {
  test('id and secret carry 160 random bits each and only the hash of the secret is kept', () => {
    const a = generateSessionToken();
    const b = generateSessionToken();
    expect(a.token).toBe(`${a.id}.${a.secret}`);
    expect(a.id).toMatch(/^[a-z2-7]{32}$/); // 32 base32 characters × 5 bits = 160 bits
    expect(a.id).not.toBe(b.id);
    expect(a.secretHash).toBe(hashSessionSecret(a.secret));
    expect(a.secretHash).not.toContain(a.secret);
    expect(secretMatches(a.secret, a.secretHash)).toBe(true);
    expect(secretMatches(b.secret, a.secretHash)).toBe(false);
    expect(secretMatches(a.secret, 'not-hex')).toBe(false);
  });

  test('SHA-256 of "abc" is the FIPS 180-2 test vector', () => {
    // Source: FIPS 180-2 Appendix B.1 (confirmed) — checks the hash primitive behind secret storage.
    expect(hashSessionSecret('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  test.each(['', 'abc', 'a.b.c', `${'a'.repeat(32)}.${'A'.repeat(32)}`, `${'a'.repeat(32)}`])('"%s" is not a token', (token) => {
    expect(parseSessionToken(token)).toBeNull();
  });
});

describe('session validation through the API', () => {
  test('a session idle longer than the inactivity limit is refused with 401 and deleted', async () => {
    const cookie = await signInAs(ctx.app, ctx.users.engineer.email);
    const later = appAt((ctx.config.sessionInactivitySeconds + 60) * 1000);
    const res = await request(later).get('/api/me').set('Cookie', cookie);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
    // The dead cookie is cleared so the browser stops sending it.
    expect(sessionSetCookie(res)).toMatch(/^slackwater_session=;/);
    expect(await ctx.db.select().from(sessions).where(eq(sessions.id, sessionIdOf(cookie)))).toEqual([]);
  });

  test('an idle session is pushed back by setting last_active_at far in the past', async () => {
    const cookie = await signInAs(ctx.app, ctx.users.approver.email);
    await ctx.db.update(sessions).set({ lastActiveAt: new Date('2000-01-01T00:00:00Z') }).where(eq(sessions.id, sessionIdOf(cookie)));
    expect((await request(ctx.app).get('/api/me').set('Cookie', cookie)).status).toBe(401);
  });

  test('activity within the hour writes nothing; after an hour last_active_at moves and the cookie is renewed', async () => {
    const cookie = await signInAs(ctx.app, ctx.users.planner.email);
    const id = sessionIdOf(cookie);
    const lastActive = async () => (await ctx.db.select().from(sessions).where(eq(sessions.id, id)))[0].lastActiveAt.getTime();
    const before = await lastActive();

    const soon = await request(appAt(SESSION_REFRESH_MS / 2)).get('/api/me').set('Cookie', cookie);
    expect(soon.status).toBe(200);
    expect(sessionSetCookie(soon)).toBeUndefined();
    expect(await lastActive()).toBe(before);

    const late = await request(appAt(SESSION_REFRESH_MS + 60_000)).get('/api/me').set('Cookie', cookie);
    expect(late.status).toBe(200);
    expect(sessionSetCookie(late)).toMatch(/^slackwater_session=[a-z2-7]+\.[a-z2-7]+;/);
    expect(await lastActive()).toBeGreaterThan(before + SESSION_REFRESH_MS);
  });

  test('a tampered secret is refused with 401, and the real session still works', async () => {
    const cookie = await signInAs(ctx.app, ctx.users.admin.email);
    const last = cookie.at(-1) === 'a' ? 'b' : 'a';
    const tampered = cookie.slice(0, -1) + last;
    expect((await request(ctx.app).get('/api/me').set('Cookie', tampered)).status).toBe(401);
    expect((await request(ctx.app).get('/api/me').set('Cookie', cookie)).status).toBe(200);
  });

  test('a token for a session id that does not exist is refused with 401', async () => {
    const { token } = generateSessionToken();
    const res = await request(ctx.app).get('/api/me').set('Cookie', `slackwater_session=${token}`);
    expect(res.status).toBe(401);
  });
});
