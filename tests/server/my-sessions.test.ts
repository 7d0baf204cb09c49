// The absolute session lifetime, and /api/me/sessions: list one's own sessions, end one, end all ("sign out
// everywhere"); nobody sees or ends another user's sessions.
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { sessions } from '../../db/schema';
import { signInAs } from './helpers/sign-in';
import { insertUser, sessionCookieFrom, sessionSetCookie, setupTestApp, TEST_PASSWORD, testConfig, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const DAY_MS = 24 * 60 * 60 * 1000;
const FIREFOX_LINUX = 'Mozilla/5.0 (X11; Linux x86_64; rv:128.0) Gecko/20100101 Firefox/128.0';
const sessionIdOf = (cookie: string) => cookie.split('=')[1].split('.')[0];

async function freshUser(): Promise<string> {
  const id = `${ctx.prefix}-${randomUUID().slice(0, 8)}`;
  await insertUser(ctx.db, { id, email: `${id}@test.example`, name: `User ${id}`, roles: ['engineer'] });
  return `${id}@test.example`;
}

async function signInWith(email: string, userAgent: string): Promise<string> {
  const res = await request(ctx.app).post('/api/auth/sign-in').set('User-Agent', userAgent).send({ email, password: TEST_PASSWORD });
  return sessionCookieFrom(res);
}

const me = (cookie: string, app = ctx.app) => request(app).get('/api/me').set('Cookie', cookie);

describe('absolute lifetime', () => {
  test('a session used every few days still ends 30 days after sign-in, and its row goes', async () => {
    const cookie = await signInAs(ctx.app, await freshUser());
    const start = Date.now();
    const appAt = (ms: number) => ctx.makeApp({ now: () => new Date(start + ms) });
    for (const day of [6, 12, 18, 24, 29]) expect((await me(cookie, appAt(day * DAY_MS))).status).toBe(200);
    // The renewed cookie never outlives the session: at day 29 at most a day is left.
    const late = await me(cookie, appAt(29.5 * DAY_MS));
    const maxAgeSeconds = Number(/Max-Age=(\d+)/.exec(sessionSetCookie(late) ?? '')?.[1]);
    expect(maxAgeSeconds).toBeLessThanOrEqual(DAY_MS / 1000);
    const ended = await me(cookie, appAt(30 * DAY_MS + 60_000));
    expect(ended.status).toBe(401);
    expect(await ctx.db.select().from(sessions).where(eq(sessions.id, sessionIdOf(cookie)))).toEqual([]);
  });

  test('SESSION_MAX_DAYS sets the lifetime', async () => {
    const cookie = await signInAs(ctx.app, await freshUser());
    const config = testConfig({ SESSION_MAX_DAYS: '2' });
    const at = (ms: number) => ctx.makeApp({ config, now: () => new Date(Date.now() + ms) });
    expect((await me(cookie, at(DAY_MS))).status).toBe(200);
    expect((await me(cookie, at(2 * DAY_MS + 60_000))).status).toBe(401);
  });
});

describe('/api/me/sessions', () => {
  test('lists only my sessions, marks this one, shows the browser and no token material', async () => {
    const email = await freshUser();
    const phone = await signInWith(email, 'Mozilla/5.0 (iPhone; CPU iPhone OS 17_0 like Mac OS X) Version/17.0 Mobile Safari/604.1');
    const desk = await signInWith(email, FIREFOX_LINUX);
    await signInAs(ctx.app, await freshUser());
    const res = await request(ctx.app).get('/api/me/sessions').set('Cookie', desk);
    expect(res.status).toBe(200);
    expect(res.body.sessions).toHaveLength(2);
    const byCurrent = (current: boolean) => res.body.sessions.find((s: { current: boolean }) => s.current === current);
    expect(byCurrent(true)).toMatchObject({ userAgent: 'Firefox on Linux', address: '127.0.0.1' });
    expect(byCurrent(false)).toMatchObject({ userAgent: 'Safari on iOS' });
    expect(byCurrent(true).expiresAt).toMatch(/Z$/);
    const text = JSON.stringify(res.body);
    for (const cookie of [phone, desk]) for (const part of cookie.split('=')[1].split('.')) expect(text).not.toContain(part);
  });

  test('ending one of my sessions by id signs that device out; another user\'s id is 404', async () => {
    const email = await freshUser();
    const phone = await signInWith(email, 'phone');
    const desk = await signInWith(email, FIREFOX_LINUX);
    const list = await request(ctx.app).get('/api/me/sessions').set('Cookie', desk);
    const phoneId = list.body.sessions.find((s: { current: boolean }) => !s.current).id;

    const stranger = await signInAs(ctx.app, await freshUser());
    const refused = await request(ctx.app).delete(`/api/me/sessions/${phoneId}`).set('Cookie', stranger);
    expect(refused.status).toBe(404);
    expect(refused.body.error.code).toBe('SESSION_NOT_FOUND');
    expect((await request(ctx.app).get('/api/me/sessions').set('Cookie', stranger)).body.sessions).toHaveLength(1);
    expect((await me(phone)).status).toBe(200);

    expect((await request(ctx.app).delete(`/api/me/sessions/${phoneId}`).set('Cookie', desk)).status).toBe(204);
    expect((await me(phone)).status).toBe(401);
    expect((await me(desk)).status).toBe(200);
    expect((await request(ctx.app).delete('/api/me/sessions/not-a-handle').set('Cookie', desk)).status).toBe(400);
  });

  test('sign out everywhere ends every session of mine, this one included, and no one else\'s', async () => {
    const email = await freshUser();
    const cookies = [await signInWith(email, 'a'), await signInWith(email, 'b'), await signInWith(email, 'c')];
    const other = await signInAs(ctx.app, await freshUser());
    const res = await request(ctx.app).post('/api/me/sessions/revoke-all').set('Cookie', cookies[0]);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ended: 3 });
    expect(sessionSetCookie(res)).toMatch(/^slackwater_session=;/);
    for (const cookie of cookies) expect((await me(cookie)).status).toBe(401);
    expect((await me(other)).status).toBe(200);
  });

  test('without a session every route answers 401', async () => {
    expect((await request(ctx.app).get('/api/me/sessions')).status).toBe(401);
    expect((await request(ctx.app).post('/api/me/sessions/revoke-all')).status).toBe(401);
  });
});
