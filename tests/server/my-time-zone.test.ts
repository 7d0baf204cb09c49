// /api/me/time-zone: every signed-in user (staff or tenant) chooses the zone their screens use; GET /api/me
// returns it, falling back to the network's zone; unknown zones are refused; the change is audited.
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { auditLog } from '../../db/schema';
import { NETWORK_TIME_ZONE } from '../../shared/time-zone';
import { signInAs } from './helpers/sign-in';
import { setupTestApp, type TestContext } from './helpers/test-app';

let ctx: TestContext;
beforeAll(async () => {
  ctx = await setupTestApp();
});
afterAll(() => ctx.close());

const setZone = (cookie: string, body: unknown) => request(ctx.app).patch('/api/me/time-zone').set('Cookie', cookie).send(body as object);
const me = (cookie: string) => request(ctx.app).get('/api/me').set('Cookie', cookie);

test('a user who has not chosen a zone reads times in the network zone', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.engineer.email);
  const res = await me(cookie);
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({ timeZone: NETWORK_TIME_ZONE, timeZoneChosen: false });
});

test.each(['planner', 'tenant'] as const)('a %s sets their own zone, GET /api/me returns it, and null goes back to the network zone', async (who) => {
  const cookie = await signInAs(ctx.app, ctx.users[who].email);
  const set = await setZone(cookie, { timeZone: 'Europe/Oslo' });
  expect(set.status).toBe(200);
  expect(set.body).toMatchObject({ id: ctx.users[who].id, timeZone: 'Europe/Oslo', timeZoneChosen: true });
  expect((await me(cookie)).body.timeZone).toBe('Europe/Oslo');
  const cleared = await setZone(cookie, { timeZone: null });
  expect(cleared.body).toMatchObject({ timeZone: NETWORK_TIME_ZONE, timeZoneChosen: false });
});

test('unknown zones, offsets and extra fields are refused with 400 and nothing changes', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.approver.email);
  for (const body of [{ timeZone: 'Mars/Olympus_Mons' }, { timeZone: '+01:00' }, { timeZone: '' }, { timeZone: 'UTC', userId: ctx.users.admin.id }, {}]) {
    expect((await setZone(cookie, body)).status).toBe(400);
  }
  expect((await me(cookie)).body.timeZone).toBe(NETWORK_TIME_ZONE);
});

test('one user cannot change another user’s zone, and signed-out requests get 401', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.admin.email);
  expect((await setZone(cookie, { timeZone: 'Asia/Tokyo' })).status).toBe(200);
  const engineer = await signInAs(ctx.app, ctx.users.engineer.email);
  expect((await me(engineer)).body.timeZone).toBe(NETWORK_TIME_ZONE);
  expect((await request(ctx.app).patch('/api/me/time-zone').send({ timeZone: 'UTC' })).status).toBe(401);
});

test('the change is written to the audit log with the zone before and after', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.noRoles.email);
  await setZone(cookie, { timeZone: 'America/New_York' });
  const rows = await ctx.db.select().from(auditLog)
    .where(and(eq(auditLog.entityId, ctx.users.noRoles.id), eq(auditLog.action, 'user.time-zone')));
  expect(rows).toHaveLength(1);
  expect(rows[0]).toMatchObject({ actorId: ctx.users.noRoles.id, before: { timeZone: null }, after: { timeZone: 'America/New_York' } });
});
