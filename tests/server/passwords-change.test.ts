// Changing one's own password (POST /api/me/password) against PostgreSQL: the current password is required, weak
// new ones are refused with feedback, the other sessions end and this one stays, for every role; audit rows hold
// no password.
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { auditLog, passwordCredentials } from '../../db/schema';
import type { RoleName } from '../../shared/api';
import { signInAs } from './helpers/sign-in';
import { insertUser, setupTestApp, TEST_PASSWORD, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const NEW_PASSWORD = 'quiet harbour crane ledger';

async function freshUser(roles: RoleName[] = ['engineer'], name?: string): Promise<{ id: string; email: string }> {
  const id = `${ctx.prefix}-${randomUUID().slice(0, 8)}`;
  const email = `${id}@test.example`;
  await insertUser(ctx.db, { id, email, name: name ?? `Sam ${id}`, roles, tenantId: roles.includes('tenant') ? ctx.tenantId : null });
  return { id, email };
}

const change = (cookie: string, body: object) => request(ctx.app).post('/api/me/password').set('Cookie', cookie).send(body);
const me = (cookie: string) => request(ctx.app).get('/api/me').set('Cookie', cookie);
const hashOf = async (id: string) => (await ctx.db.select().from(passwordCredentials).where(eq(passwordCredentials.userId, id)))[0].passwordHash;

test('without a session: 401', async () => {
  const res = await request(ctx.app).post('/api/me/password').send({ currentPassword: TEST_PASSWORD, newPassword: NEW_PASSWORD });
  expect(res.status).toBe(401);
});

test('a wrong current password is refused and nothing changes; the attempt is audited without the passwords', async () => {
  const { id, email } = await freshUser();
  const cookie = await signInAs(ctx.app, email);
  const before = await hashOf(id);
  const res = await change(cookie, { currentPassword: 'not-my-password-1', newPassword: NEW_PASSWORD });
  expect([res.status, res.body.error.code]).toEqual([400, 'CURRENT_PASSWORD_WRONG']);
  expect(await hashOf(id)).toBe(before);
  expect((await me(cookie)).status).toBe(200);
  const rows = await ctx.db.select().from(auditLog).where(eq(auditLog.entityId, id));
  expect(rows.map((r) => r.action)).toContain('password-change-refused');
  expect(JSON.stringify(rows)).not.toMatch(/not-my-password-1|quiet harbour/);
});

test.each([
  ['short', 'tiny-pass', /at least 12 characters/],
  ['common', 'password1234', /commonly used password/],
  ['a keyboard row', 'qwertyuiopasdf', /(row of keys|commonly used|easy to guess)/],
  ['built from their own name', 'Morgan Pellow 2024', /your own name or e-mail address/],
])('a %s new password is refused with feedback in plain words', async (_kind, newPassword, feedback) => {
  const { id, email } = await freshUser(['engineer'], 'Morgan Pellow');
  const cookie = await signInAs(ctx.app, email);
  const before = await hashOf(id);
  const res = await change(cookie, { currentPassword: TEST_PASSWORD, newPassword });
  expect([res.status, res.body.error.code]).toEqual([400, 'WEAK_PASSWORD']);
  expect(res.body.error.message).toMatch(feedback);
  expect(res.body.error.message).not.toContain(newPassword);
  expect(await hashOf(id)).toBe(before);
});

test('the current password again is refused', async () => {
  const { email } = await freshUser();
  const cookie = await signInAs(ctx.app, email);
  const res = await change(cookie, { currentPassword: TEST_PASSWORD, newPassword: TEST_PASSWORD });
  expect([res.status, res.body.error.code]).toEqual([400, 'SAME_PASSWORD']);
});

test.each<RoleName>(['admin', 'engineer', 'planner', 'approver', 'tenant'])(
  'as %s: the change ends my other sessions, keeps this one, and the new password signs in', async (role) => {
    const { id, email } = await freshUser([role]);
    const [here, elsewhere] = [await signInAs(ctx.app, email), await signInAs(ctx.app, email)];
    const res = await change(here, { currentPassword: TEST_PASSWORD, newPassword: NEW_PASSWORD });
    expect([res.status, res.body]).toEqual([200, { otherSessionsEnded: 1 }]);
    expect([(await me(here)).status, (await me(elsewhere)).status]).toEqual([200, 401]);
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email, password: TEST_PASSWORD })).status).toBe(401);
    expect((await request(ctx.app).post('/api/auth/sign-in').send({ email, password: NEW_PASSWORD })).status).toBe(200);
    const [row] = await ctx.db.select().from(auditLog).where(eq(auditLog.entityId, id)).then((rows) => rows.filter((r) => r.action === 'password-changed'));
    expect([row.actorId, row.after]).toEqual([id, { otherSessionsEnded: 1 }]);
    expect(JSON.stringify(row)).not.toContain(NEW_PASSWORD);
  });

test('the body cannot name another user: only the signed-in user changes', async () => {
  const [mine, theirs] = [await freshUser(), await freshUser()];
  const theirHash = await hashOf(theirs.id);
  const cookie = await signInAs(ctx.app, mine.email);
  const res = await change(cookie, { currentPassword: TEST_PASSWORD, newPassword: NEW_PASSWORD, userId: theirs.id, email: theirs.email });
  expect(res.status).toBe(200);
  expect(await hashOf(theirs.id)).toBe(theirHash);
  expect(await hashOf(mine.id)).not.toBe(theirHash);
});

test('guessing the current password from an open session hits the sign-in limit of the account', async () => {
  const { email } = await freshUser();
  const limited = ctx.makeApp({ signInLimit: { windowMs: 60_000, perAccount: 2, perAddress: 1000 } });
  const cookie = await signInAs(limited, email);
  const guess = () => request(limited).post('/api/me/password').set('Cookie', cookie).send({ currentPassword: 'wrong-guess-123', newPassword: NEW_PASSWORD });
  expect([(await guess()).status, (await guess()).status]).toEqual([400, 400]);
  expect((await guess()).status).toBe(429);
});
