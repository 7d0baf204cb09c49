// Notices API: lead-time block and admin override, resend after a failure, the tenant portal, acknowledgement,
// the .ics download, withdrawal through the lifecycle route, and tenant isolation on every notice route.
import { and, eq } from 'drizzle-orm';
import { auditLog, notices, users, windows } from '../../../db/schema';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { issueNotices } from '../../../server/services/notices/issue-notices';
import { insertClearedWindow, NOW, setupNoticesApp, type NoticesContext } from './fixture';
import { parseInvitation } from './ics-check';

let ctx: NoticesContext;
beforeAll(async () => { ctx = await setupNoticesApp(); });
afterAll(async () => { await ctx.close(); });

const issue = (windowId: string) => ctx.db.transaction((tx) =>
  issueNotices(tx, { jobs: ctx.queue, config: ctx.config, now: NOW }, windowId, ctx.users.approver.id));
const noticeOf = async (windowId: string, tenantId: string) =>
  (await ctx.db.select().from(notices).where(and(eq(notices.windowId, windowId), eq(notices.tenantId, tenantId))))[0];
const windowStatus = async (id: string) => (await ctx.db.select({ s: windows.status }).from(windows).where(eq(windows.id, id)))[0].s;
// Each test gets a window of its own (a fresh key per call), so any one of them can run alone.
let made = 0;
const freshWindow = (key: string, startDays: number) => insertClearedWindow(ctx, `${key}-${++made}`, startDays);

describe('lead time', () => {
  let windowId: string;
  let issued: Awaited<ReturnType<typeof issue>>;
  beforeEach(async () => {
    windowId = await freshWindow('late', 5);
    ctx.queue.mails.length = 0;
    issued = await issue(windowId);
  });

  it('blocks notices later than the lead time (the policy floor of 7 days beats a 3-day contract) and keeps the window cleared', async () => {
    expect(issued).toEqual({ queued: 0, blocked: 2 });
    expect(ctx.queue.mails).toHaveLength(0);
    expect(await windowStatus(windowId)).toBe('cleared');
    const other = await noticeOf(windowId, ctx.otherTenantId);
    expect((other.content as { leadDays: number }).leadDays).toBe(7);
  });

  it('hides a blocked notice from its tenant', async () => {
    const own = await noticeOf(windowId, ctx.tenantId);
    expect((await (await ctx.as('tenant'))('get', `/api/notices/${own.id}`)).status).toBe(404);
    const work = await (await ctx.as('tenant'))('get', '/api/portal/work');
    // Tenants learn of work from its notice: held back, the work is not in the portal at all.
    expect(work.body.items.find((i: { windowId: string }) => i.windowId === windowId)).toBeUndefined();
  });

  it('lets only an admin override, only with a reason, and shows the reason in the notice', async () => {
    const own = await noticeOf(windowId, ctx.tenantId);
    expect((await (await ctx.as('planner'))('post', `/api/notices/${own.id}/override`).send({ reason: 'Storm damage repair' })).status).toBe(403);
    const short = await (await ctx.as('admin'))('post', `/api/notices/${own.id}/override`).send({ reason: 'x' });
    expect([short.status, short.body.error.code]).toEqual([400, 'VALIDATION_FAILED']);
    const res = await (await ctx.as('admin'))('post', `/api/notices/${own.id}/override`).send({ reason: 'Storm damage repair cannot wait' });
    expect(res.status).toBe(200);
    expect(res.body.notice).toMatchObject({ status: 'queued', content: { leadOverrideReason: 'Storm damage repair cannot wait' } });
    expect(ctx.queue.mails).toHaveLength(1);
    expect(ctx.queue.mails[0].text).toContain('less than the agreed 7 days of notice. Reason: Storm damage repair cannot wait');
    const audit = await ctx.db.select().from(auditLog).where(and(eq(auditLog.entityId, own.id), eq(auditLog.action, 'notice.override')));
    expect(audit[0].after).toMatchObject({ reason: 'Storm damage repair cannot wait', status: 'queued' });
    // The other tenant's notice is still held back, so the window is not notified yet.
    expect(await windowStatus(windowId)).toBe('cleared');
  });

  it('notifies the window once the last blocked notice is overridden, and refuses a second override', async () => {
    const own = await noticeOf(windowId, ctx.tenantId);
    const other = await noticeOf(windowId, ctx.otherTenantId);
    const admin = await ctx.as('admin');
    expect((await admin('post', `/api/notices/${own.id}/override`).send({ reason: 'Storm damage repair cannot wait' })).status).toBe(200);
    expect(await windowStatus(windowId)).toBe('cleared');
    expect((await admin('post', `/api/notices/${other.id}/override`).send({ reason: 'Agreed by phone with the desk' })).status).toBe(200);
    expect(await windowStatus(windowId)).toBe('notified');
    const again = await admin('post', `/api/notices/${other.id}/override`).send({ reason: 'Agreed by phone with the desk' });
    expect([again.status, again.body.error.code]).toEqual([409, 'NOTICE_STATE']);
  });
});

describe('staff view and resend', () => {
  let windowId: string;
  beforeEach(async () => {
    windowId = await freshWindow('staff', 30);
    await issue(windowId);
  });

  it('lists each tenant notice with its sending state for staff only', async () => {
    const res = await (await ctx.as('approver'))('get', `/api/windows/${windowId}/notices`);
    expect(res.status).toBe(200);
    expect(res.body.notices.map((n: { tenantId: string }) => n.tenantId).sort()).toEqual([ctx.tenantId, ctx.otherTenantId].sort());
    expect(res.body.notices[0]).toMatchObject({ status: 'queued', attempts: 0, lastError: null, sentAt: null, acknowledgedAt: null });
    // For tenants the window's internal routes do not find it (404), as on every internal window route.
    expect((await (await ctx.as('tenant'))('get', `/api/windows/${windowId}/notices`)).status).toBe(404);
    expect((await (await ctx.as('approver'))('get', `/api/windows/${ctx.id('nope')}/notices`)).status).toBe(404);
  });

  it('resends a failed notice (admin or planner) and refuses one that did not fail', async () => {
    const own = await noticeOf(windowId, ctx.tenantId);
    const planner = await ctx.as('planner');
    expect((await planner('post', `/api/notices/${own.id}/resend`)).status).toBe(409);
    await ctx.db.update(notices).set({ status: 'failed', attempts: 4, lastError: 'ECONNREFUSED' }).where(eq(notices.id, own.id));
    const before = ctx.queue.mails.length;
    expect((await (await ctx.as('approver'))('post', `/api/notices/${own.id}/resend`)).status).toBe(403);
    const res = await planner('post', `/api/notices/${own.id}/resend`);
    expect(res.status).toBe(200);
    expect(res.body.notice.status).toBe('queued');
    expect(ctx.queue.mails.length).toBe(before + 1);
    expect(ctx.queue.mails.at(-1)!.noticeId).toBe(own.id);
  });
});

describe('tenant portal', () => {
  let windowId: string;
  let ownId: string;
  let otherId: string;
  beforeEach(async () => {
    windowId = await freshWindow('portal', 25);
    await issue(windowId);
    ownId = (await noticeOf(windowId, ctx.tenantId)).id;
    otherId = (await noticeOf(windowId, ctx.otherTenantId)).id;
  });

  it('lists upcoming work on the tenant\'s slices with its notice and the zone', async () => {
    const res = await (await ctx.as('tenant'))('get', '/api/portal/work');
    expect(res.status).toBe(200);
    // A tenant user who chose no zone reads the network's.
    expect(res.body.timeZone).toBe(NETWORK_TIME_ZONE);
    const item = res.body.items.find((i: { windowId: string }) => i.windowId === windowId);
    expect(item.notice.id).toBe(ownId);
    expect(item.summary).toBe('Planned network maintenance (fibre splice)');
    expect(JSON.stringify(res.body)).not.toContain(otherId);
    expect((await (await ctx.as('planner'))('get', '/api/portal/work')).status).toBe(403);
  });

  it('lists the work in the zone the signed-in tenant user chose, the zone the portal shows its times in', async () => {
    await ctx.db.update(users).set({ timeZone: 'Asia/Kolkata' }).where(eq(users.id, ctx.users.tenant.id));
    try {
      const res = await (await ctx.as('tenant'))('get', '/api/portal/work');
      expect(res.status).toBe(200);
      expect(res.body.timeZone).toBe('Asia/Kolkata');
      expect(res.body.items.some((i: { windowId: string }) => i.windowId === windowId)).toBe(true);
    } finally {
      await ctx.db.update(users).set({ timeZone: null }).where(eq(users.id, ctx.users.tenant.id));
    }
  });

  it('answers 404 on every notice route for another tenant\'s notice, as for a missing one', async () => {
    const other = await ctx.as('otherTenant');
    for (const [method, path] of [['get', ''], ['post', '/acknowledge'], ['get', '/ics']] as const) {
      const res = await other(method, `/api/notices/${ownId}${path}`);
      expect([path, res.status, res.body.error?.code]).toEqual([path, 404, 'NOTICE_NOT_FOUND']);
    }
    expect((await other('get', `/api/notices/${otherId}`)).status).toBe(200);
    const own = await ctx.as('tenant');
    for (const path of [`/api/notices/${ownId}/override`, `/api/notices/${ownId}/resend`]) {
      expect((await own('post', path).send({ reason: 'I would like to send it' })).status).toBe(403);
    }
  });

  it('serves the invitation as a text/calendar attachment', async () => {
    const res = await (await ctx.as('tenant'))('get', `/api/notices/${ownId}/ics`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/calendar/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename=".+\.ics"$/);
    expect(parseInvitation(res.text).uid).toEqual([`${windowId}.${ctx.tenantId}@slackwater.invalid`]);
  });

  it('records the acknowledgement with time and user, once, with an audit row', async () => {
    const tenant = await ctx.as('tenant');
    const res = await tenant('post', `/api/notices/${ownId}/acknowledge`);
    expect(res.status).toBe(200);
    expect(res.body.notice.acknowledgedAt).toBe(NOW.toISOString());
    expect(res.body.notice.acknowledgedByName).toBe(`User ${ctx.users.tenant.id}`);
    const row = await noticeOf(windowId, ctx.tenantId);
    expect(row.acknowledgedBy).toBe(ctx.users.tenant.id);
    await tenant('post', `/api/notices/${ownId}/acknowledge`);
    const audit = await ctx.db.select().from(auditLog).where(and(eq(auditLog.entityId, ownId), eq(auditLog.action, 'notice.acknowledge')));
    expect(audit).toHaveLength(1);
    expect(audit[0].actorId).toBe(ctx.users.tenant.id);
  });

  it('withdrawing the window through the lifecycle route sends the cancellations', async () => {
    const [w] = await ctx.db.select({ version: windows.version }).from(windows).where(eq(windows.id, windowId));
    const before = ctx.queue.mails.length;
    const res = await (await ctx.as('planner'))('post', `/api/windows/${windowId}/transition`).send({ to: 'withdrawn', version: w.version, reason: 'Work moved to next quarter' });
    expect(res.status).toBe(200);
    const sent = ctx.queue.mails.slice(before);
    expect(sent.map((m) => m.calendar?.method)).toEqual(['CANCEL', 'CANCEL']);
    const p = parseInvitation((await noticeOf(windowId, ctx.tenantId)).ics);
    expect([p.method, p.status, p.sequence]).toEqual(['CANCEL', 'CANCELLED', 1]);
    // The tenant still sees the cancelled work in its portal.
    const work = await (await ctx.as('tenant'))('get', '/api/portal/work');
    const item = work.body.items.find((i: { windowId: string }) => i.windowId === windowId);
    expect(item.notice.content.cancelled).toBe(true);
  });
});
