// Private calendar feeds: the address (made once, shown again, replaced on revoke), the feed without a cookie,
// staff and tenant contents, cancellations, SEQUENCE after edits, and scoping by the owner's roles as they are now.
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { auditLog, roleGrants, users } from '../../../db/schema';
import { calendarFeedSchema } from '../../../shared/calendar-feeds';
import { STATUS_LABELS } from '../../../components/windows/lifecycle';
import { FEED_STATUS_WORDS } from '../../../server/services/feeds/staff-feed';
import { signedInRequests } from '../helpers/sign-in';
import { insertUser } from '../helpers/test-app';
import { internalNames } from '../notices/fixture';
import { setupTenantViews, type TenantViewsContext } from '../notices/tenant-fixture';
import { eventOf, parseFeed } from './parse-feed';

let ctx: TenantViewsContext;
beforeAll(async () => {
  ctx = await setupTenantViews();
}, 60_000);
afterAll(async () => { await ctx.close(); });

type Who = 'planner' | 'engineer' | 'tenant' | 'otherTenant' | 'tenantless' | 'noRoles';
const as = (who: Who) => (who === 'tenant' || who === 'otherTenant' || who === 'tenantless' ? ctx.asTenant(who) : ctx.as(who));

async function feedUrlOf(who: Who): Promise<string> {
  const res = await (await as(who))('get', '/api/me/calendar-feed');
  expect(res.status).toBe(200);
  return calendarFeedSchema.parse(res.body).url;
}

/** The feed behind `url`, fetched with no cookie at all. */
const fetchFeed = (url: string) => request(ctx.app).get(new URL(url).pathname);

async function feedOf(who: Who) {
  const res = await fetchFeed(await feedUrlOf(who));
  expect(res.status).toBe(200);
  return { res, feed: parseFeed(res.text) };
}

test('the address is made on first request, shown again after, and carries a 256-bit token', async () => {
  const first = await feedUrlOf('planner');
  expect(first).toMatch(/\/api\/calendar-feeds\/[A-Za-z0-9_-]{43}\.ics$/);
  expect(first.startsWith(ctx.config.publicUrl)).toBe(true);
  expect(await feedUrlOf('planner')).toBe(first);
  expect(await feedUrlOf('engineer')).not.toBe(first);
  const made = await ctx.db.select().from(auditLog)
    .where(and(eq(auditLog.action, 'calendar-feed.create'), eq(auditLog.entityId, ctx.users.planner.id)));
  expect(made).toHaveLength(1);
  expect(JSON.stringify(made)).not.toContain(/([A-Za-z0-9_-]{43})\.ics$/.exec(first)![1]);
});

test('asking for an address needs a session and a role that reads windows', async () => {
  expect((await request(ctx.app).get('/api/me/calendar-feed')).status).toBe(401);
  expect((await request(ctx.app).delete('/api/me/calendar-feed')).status).toBe(401);
  expect((await (await ctx.as('noRoles'))('get', '/api/me/calendar-feed')).status).toBe(403);
});

test('the feed answers text/calendar without a cookie, sets none and is not kept by caches', async () => {
  const { res, feed } = await feedOf('planner');
  expect(res.headers['content-type']).toBe('text/calendar; charset=utf-8');
  expect(res.headers['cache-control']).toBe('no-store');
  expect(res.headers['set-cookie']).toBeUndefined();
  // A published feed, not an invitation: no METHOD, so calendars subscribe rather than ask for replies.
  expect(feed.method).toBeNull();
  expect(feed.name).toBe('Slackwater: maintenance windows');
});

test('staff read every window with its state in the summary, elements by name, UTC times and a link back', async () => {
  const { feed } = await feedOf('planner');
  for (const id of [ctx.notified, ctx.unnotified, ctx.blocked]) expect(eventOf(feed, id)).toBeDefined();
  const notified = eventOf(feed, ctx.notified)!;
  expect(notified.uid).toBe(`${ctx.notified}@slackwater.invalid`);
  expect(notified.summary).toBe(`[Notified] ${ctx.internals.title}`);
  expect(notified.status).toBe('CONFIRMED');
  expect(notified.startText).toMatch(/Z$/);
  expect(notified.startUtc).toBe('2031-05-26T08:00:00.000Z');
  expect(notified.description).toContain('Hidden Point X1: down');
  expect(notified.description).toContain('When (UTC): ');
  expect(notified.url).toBe(`${ctx.config.publicUrl}/windows/${ctx.notified}`);
  expect(eventOf(feed, ctx.unnotified)!.summary).toBe(`[Cleared] ${ctx.internals.title}`);
});

test('a tenant reads only the work it was told of, in the words and under the UID of its notice', async () => {
  const { feed } = await feedOf('tenant');
  expect(feed.name).toBe('Slackwater: planned work on your slices');
  const ours = feed.events.filter((e) => e.uid.includes(ctx.prefix));
  expect(ours.map((e) => e.uid)).toEqual([`${ctx.notified}.${ctx.tenantId}@slackwater.invalid`]);
  const [event] = ours;
  expect(event.summary).toBe('Planned network maintenance (fibre splice)');
  expect(event.status).toBe('CONFIRMED');
  expect(event.description).toContain('Port cranes');
  expect(event.description).toContain('Harbour pilots');
  expect(event.url).toMatch(new RegExp(`^${ctx.config.publicUrl}/notices/ntc-`));
});

test("a tenant's feed never holds a window title, internal names or another tenant's work", async () => {
  const i = ctx.internals;
  const secrets = [i.title, 'Fibre splice, Hidden Point', i.ownerName, i.notes, i.mopFileName, i.overrideReason,
    ...internalNames(ctx.id), ctx.unnotified, ctx.blocked, ctx.otherTenantId, 'Other Harbour Co', 'Yard cameras', '[Notified]'];
  const own = (await fetchFeed(await feedUrlOf('tenant'))).text;
  expect(secrets.filter((s) => own.includes(s))).toEqual([]);
  const other = (await fetchFeed(await feedUrlOf('otherTenant'))).text;
  expect(other).toContain('Yard cameras');
  expect([i.title, 'Port cranes', 'Harbour pilots', ctx.tenantId].filter((s) => other.includes(s))).toEqual([]);
  expect(parseFeed((await fetchFeed(await feedUrlOf('tenantless'))).text).events).toEqual([]);
});

test('an edit raises SEQUENCE and changes the summary; the UID stays', async () => {
  const url = await feedUrlOf('planner');
  const before = eventOf(parseFeed((await fetchFeed(url)).text), ctx.unnotified)!;
  const window = (await (await ctx.as('planner'))('get', `/api/windows/${ctx.unnotified}`)).body;
  const title = `Splice moved to the night shift (${ctx.prefix})`;
  const edit = await (await ctx.as('engineer'))('patch', `/api/windows/${ctx.unnotified}`).send({ version: window.version, title });
  expect(edit.status).toBe(200);
  const after = eventOf(parseFeed((await fetchFeed(url)).text), ctx.unnotified)!;
  expect(after.uid).toBe(before.uid);
  expect(after.sequence).toBeGreaterThan(before.sequence ?? 0);
  expect(after.summary).toContain(title);
});

test('a withdrawn window stays in both feeds as cancelled, the tenant one in its cancellation words', async () => {
  const staffUrl = await feedUrlOf('planner');
  const tenantUrl = await feedUrlOf('tenant');
  const beforeTenant = parseFeed((await fetchFeed(tenantUrl)).text).events.find((e) => e.uid.startsWith(ctx.notified))!;
  const window = (await (await ctx.as('planner'))('get', `/api/windows/${ctx.notified}`)).body;
  const withdraw = await (await ctx.as('admin'))('post', `/api/windows/${ctx.notified}/transition`)
    .send({ to: 'withdrawn', version: window.version, reason: 'Splice no longer needed' });
  expect(withdraw.status).toBe(200);
  const staff = eventOf(parseFeed((await fetchFeed(staffUrl)).text), ctx.notified)!;
  expect([staff.status, staff.summary]).toEqual(['CANCELLED', `[Withdrawn] ${ctx.internals.title}`]);
  const tenant = parseFeed((await fetchFeed(tenantUrl)).text).events.find((e) => e.uid.startsWith(ctx.notified))!;
  expect([tenant.status, tenant.summary]).toEqual(['CANCELLED', 'Cancelled: Planned network maintenance (fibre splice)']);
  expect(tenant.uid).toBe(beforeTenant.uid);
  expect(tenant.sequence).toBe((beforeTenant.sequence ?? 0) + 1);
  expect(tenant.description).toContain('has been withdrawn');
});

test('revoking ends the address at once; the next request makes a new one that works', async () => {
  const old = await feedUrlOf('engineer');
  expect((await fetchFeed(old)).status).toBe(200);
  expect((await (await ctx.as('engineer'))('delete', '/api/me/calendar-feed')).status).toBe(204);
  const gone = await fetchFeed(old);
  expect([gone.status, gone.body.error?.code]).toEqual([404, 'FEED_NOT_FOUND']);
  const fresh = await feedUrlOf('engineer');
  expect(fresh).not.toBe(old);
  expect((await fetchFeed(fresh)).status).toBe(200);
  expect((await fetchFeed(old)).status).toBe(404);
});

test('malformed and unknown addresses answer the same 404, which never repeats the address', async () => {
  const unknown = `/api/calendar-feeds/${'A'.repeat(43)}.ics`;
  for (const path of [unknown, '/api/calendar-feeds/short.ics', `/api/calendar-feeds/${'A'.repeat(43)}`, `/api/calendar-feeds/${'A'.repeat(42)}%2B.ics`]) {
    const res = await request(ctx.app).get(path);
    expect([path, res.status, res.body.error?.code]).toEqual([path, 404, 'FEED_NOT_FOUND']);
    expect(JSON.stringify(res.body)).not.toContain('AAAAAAAAAA');
  }
});

test("the feed follows its owner's roles as they are now: none left means no feed, tenant only means tenant words", async () => {
  const user = { id: `${ctx.prefix}-mover`, email: `mover.${ctx.prefix}@test.example` };
  await insertUser(ctx.db, { ...user, name: 'Role mover', tenantId: ctx.tenantId, roles: ['planner', 'tenant'] });
  const mover = signedInRequests(ctx.app, () => user.email);
  const res = await (await mover('x'))('get', '/api/me/calendar-feed');
  const url = calendarFeedSchema.parse(res.body).url;
  expect(parseFeed((await fetchFeed(url)).text).name).toBe('Slackwater: maintenance windows');
  await ctx.db.delete(roleGrants).where(and(eq(roleGrants.userId, user.id), eq(roleGrants.role, 'planner')));
  const tenantOnly = await fetchFeed(url);
  expect(parseFeed(tenantOnly.text).name).toBe('Slackwater: planned work on your slices');
  expect(tenantOnly.text).not.toContain(ctx.internals.title);
  await ctx.db.delete(roleGrants).where(eq(roleGrants.userId, user.id));
  expect((await fetchFeed(url)).status).toBe(404);
  await ctx.db.delete(users).where(eq(users.id, user.id));
  expect((await fetchFeed(url)).status).toBe(404);
});

test("the feed's state words are the screens' words", () => {
  expect(FEED_STATUS_WORDS).toEqual(STATUS_LABELS);
});
