// issueNotices / withdrawNotices: one tenant-facing notice per affected tenant, invitations that satisfy
// RFC 5545/5546 when parsed back with ical.js, SEQUENCE on re-issue, CANCEL on withdrawal.
import { eq } from 'drizzle-orm';
import { notices, users, windows } from '../../../db/schema';
import { issueNotices } from '../../../server/services/notices/issue-notices';
import { withdrawNotices } from '../../../server/services/notices/withdraw-notices';
import { noticeContentSchema } from '../../../shared/notices';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { insertClearedWindow, internalNames, NOW, setupNoticesApp, type NoticesContext } from './fixture';
import { expectRfc5545Event, parseInvitation } from './ics-check';

let ctx: NoticesContext;
beforeAll(async () => { ctx = await setupNoticesApp(); });
afterAll(async () => { await ctx.close(); });

const deps = () => ({ jobs: ctx.queue, config: ctx.config, now: NOW });
const issue = (windowId: string) => ctx.db.transaction((tx) => issueNotices(tx, deps(), windowId, ctx.users.planner.id));
const rowsOf = (windowId: string) => ctx.db.select().from(notices).where(eq(notices.windowId, windowId));
const statusOf = async (windowId: string) => (await ctx.db.select({ s: windows.status }).from(windows).where(eq(windows.id, windowId)))[0].s;

describe('issueNotices', () => {
  // Each test issues notices for a window of its own, so any one of them can run alone.
  let windowId: string;
  let made = 0;
  beforeEach(async () => {
    windowId = await insertClearedWindow(ctx, `compose-${++made}`, 20);
    ctx.queue.mails.length = 0;
    expect(await issue(windowId)).toEqual({ queued: 2, blocked: 0 });
  });

  it('composes one notice per affected tenant and moves the window to notified', async () => {
    const rows = await rowsOf(windowId);
    expect(rows.map((r) => r.tenantId).sort()).toEqual([ctx.tenantId, ctx.otherTenantId].sort());
    expect(rows.every((r) => r.status === 'queued' && r.method === 'REQUEST' && r.sequence === 0)).toBe(true);
    expect(await statusOf(windowId)).toBe('notified');
  });

  it('says what moves where in tenant-facing words, with the effect, times in the zone and UTC, and a contact', async () => {
    const own = noticeContentSchema.parse((await rowsOf(windowId)).find((r) => r.tenantId === ctx.tenantId)!.content);
    const cranes = own.slices.find((s) => s.slice === ctx.id('A'))!;
    // Sites 0.1° of latitude apart: about 11.1 km on the sphere.
    expect(cranes.changes).toContain('Function "Crane gateway" moves to another site 11 km away.');
    expect(cranes.changes).toContain('The link between "Crane gateway" and "Crane control" is rerouted on a different path; latency 3.0 ms → 1.5 ms, within its 10.0 ms budget.');
    expect(cranes.effect).toBe('hitless');
    expect(cranes.effectText).toMatch(/make-before-break/);
    const pilots = own.slices.find((s) => s.slice === ctx.id('B'))!;
    expect(pilots).toMatchObject({ critical: true, outcome: 'stays', effect: 'none' });
    expect(pilots.changes.join(' ')).toMatch(/without that protection/);
    expect(own.effect).toBe('hitless');
    expect(own.whenLocal).toMatch(/GMT-1$/);
    expect(own.whenUtc).toMatch(/UTC$/);
    expect(own.contact.email).toBe('maintenance@slackwater.invalid');
    expect(own.summary).toBe('Planned network maintenance (fibre splice)');
  });

  it('states the interruption of an unresolved slice whose outage was accepted', async () => {
    const other = noticeContentSchema.parse((await rowsOf(windowId)).find((r) => r.tenantId === ctx.otherTenantId)!.content);
    expect(other.slices).toHaveLength(1);
    expect(other.effect).toBe('interruption');
    expect(other.slices[0].effectText).toMatch(/accepted this outage/);
    expect(other.slices[0].effectText).toContain(other.whenLocal);
  });

  it('never names an internal site, span or the window title anywhere a tenant reads', async () => {
    const [w] = await ctx.db.select({ title: windows.title }).from(windows).where(eq(windows.id, windowId));
    for (const row of await rowsOf(windowId)) {
      const everything = [JSON.stringify(row.content), row.subject, row.body, row.ics].join('\n');
      for (const name of [...internalNames(ctx.id), w.title]) expect(everything).not.toContain(name);
    }
  });

  it('queues one mail per tenant to its contacts and users, with the invitation attached', async () => {
    expect(ctx.queue.mails).toHaveLength(2);
    const own = ctx.queue.mails.find((m) => m.to.includes(`ops.${ctx.prefix}@own.example`))!;
    expect(own.to).toContain(ctx.users.tenant.email.toLowerCase());
    expect(own.calendar?.method).toBe('REQUEST');
    expect(own.noticeId).toBeTruthy();
  });

  it('writes an invitation that ical.js parses into an RFC 5545 event with METHOD:REQUEST and SEQUENCE 0', async () => {
    const row = (await rowsOf(windowId)).find((r) => r.tenantId === ctx.tenantId)!;
    const p = parseInvitation(row.ics);
    expectRfc5545Event(p);
    expect(p.method).toBe('REQUEST');
    expect(p.uid).toEqual([`${windowId}.${ctx.tenantId}@slackwater.invalid`]);
    expect(p.sequence).toBe(0);
    expect(p.status).toBe('CONFIRMED');
    expect(p.startUtc).toBe(new Date(NOW.getTime() + 20 * 86_400_000).toISOString());
  });

  it('re-issues after the window was cleared again: same UID, SEQUENCE + 1, marked as an update', async () => {
    const before = await rowsOf(windowId);
    await ctx.db.update(windows).set({ status: 'cleared' }).where(eq(windows.id, windowId));
    await issue(windowId);
    const after = await rowsOf(windowId);
    for (const row of after) {
      const prev = before.find((b) => b.tenantId === row.tenantId)!;
      expect([row.id, row.uid, row.sequence]).toEqual([prev.id, prev.uid, prev.sequence + 1]);
      expect(row.subject).toMatch(/^Updated: /);
      expect(parseInvitation(row.ics).sequence).toBe(prev.sequence + 1);
    }
  });

  it('withdrawal cancels every invitation: METHOD:CANCEL, STATUS:CANCELLED, SEQUENCE + 1, same UID', async () => {
    const before = await rowsOf(windowId);
    ctx.queue.mails.length = 0;
    const result = await ctx.db.transaction((tx) => withdrawNotices(tx, deps(), windowId, ctx.users.admin.id));
    expect(result.cancelled).toBe(2);
    expect(ctx.queue.mails.map((m) => m.calendar?.method)).toEqual(['CANCEL', 'CANCEL']);
    for (const row of await rowsOf(windowId)) {
      const prev = before.find((b) => b.tenantId === row.tenantId)!;
      const p = parseInvitation(row.ics);
      expectRfc5545Event(p);
      // RFC 5546 §3.2.5 (secondary, REFERENCES.md): CANCEL with STATUS:CANCELLED, same UID, higher SEQUENCE.
      expect([p.method, p.status, p.uid[0], p.sequence]).toEqual(['CANCEL', 'CANCELLED', prev.uid, prev.sequence + 1]);
      expect(row.subject).toMatch(/^Cancelled: /);
    }
  });

  it('refuses a window that is not cleared', async () => {
    await expect(issue(windowId)).rejects.toThrow(/cleared/);
  });
});

describe('the zone a notice is written in', () => {
  it('is the zone the tenant’s people chose; a tenant whose people chose none reads the network zone', async () => {
    await ctx.db.update(users).set({ timeZone: 'Asia/Kolkata' }).where(eq(users.id, ctx.users.tenant.id));
    try {
      const windowId = await insertClearedWindow(ctx, 'zone-choice', 20);
      await issue(windowId);
      const contentOf = async (tenantId: string) => noticeContentSchema.parse((await rowsOf(windowId)).find((r) => r.tenantId === tenantId)!.content);
      const own = await contentOf(ctx.tenantId);
      expect(own.timeZone).toBe('Asia/Kolkata');
      expect(own.whenLocal).toMatch(/GMT\+5:30$/);
      const other = await contentOf(ctx.otherTenantId);
      expect(other.timeZone).toBe(NETWORK_TIME_ZONE);
      expect(other.whenLocal).toMatch(/GMT-1$/);
    } finally {
      await ctx.db.update(users).set({ timeZone: null }).where(eq(users.id, ctx.users.tenant.id));
    }
  });
});
