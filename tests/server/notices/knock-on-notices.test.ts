// A knock-on move in a cleared plan: the tenant of a slice the window does not touch, moved to make room, gets a
// notice like any affected tenant (e-mail + invitation) in tenant-facing words, and never reads the names of the
// other tenant's slices it makes room for.
import { eq } from 'drizzle-orm';
import { notices, placements, sliceFunctions, sliceTies, slices, tenants, windows } from '../../../db/schema';
import { describeSlice } from '../../../server/services/notices/slice-wording';
import { issueNotices } from '../../../server/services/notices/issue-notices';
import { noticeContentSchema } from '../../../shared/notices';
import type { PlanSlice } from '../../../shared/plans';
import { insertClearedWindow, internalNames, NOW, planSlices, setupNoticesApp, type NoticesContext } from './fixture';
import { parseInvitation, expectRfc5545Event } from './ics-check';

let ctx: NoticesContext;
let quayTenantId: string;

/** A third tenant whose slice D (X3 ↔ X2 over s2) the window (X1 down) does not touch. */
async function insertQuayTenant(): Promise<string> {
  const id = ctx.id;
  const tenantId = id('quay-tenant');
  await ctx.db.transaction(async (tx) => {
    await tx.insert(tenants).values({ id: tenantId, name: 'Quay Logistics', noticeDays: 3, contacts: [{ name: 'Quay desk', email: `desk.${ctx.prefix}@quay.example` }] });
    await tx.insert(slices).values({ id: id('D'), tenantId, name: 'Forklift tracking', sst: 3, priority: 4 });
    await tx.insert(sliceFunctions).values([
      { id: id('fd1'), sliceId: id('D'), name: 'Tracker hub', cpu: 2 }, { id: id('fd2'), sliceId: id('D'), name: 'Tracker store', cpu: 2 },
    ]);
    await tx.insert(sliceTies).values({ id: id('td'), sliceId: id('D'), fromFunction: id('fd1'), toFunction: id('fd2'), bandwidthGbps: 1, maxLatencyMs: 10 });
    await tx.insert(placements).values({ sliceId: id('D'), revision: 1, sites: { [id('fd1')]: id('X3'), [id('fd2')]: id('X2') }, paths: { [id('td')]: [id('s2')] } });
  });
  return tenantId;
}

/** D's hub moves X3 → X2 (both ends then share a site) to make room for the own tenant's "Port cranes". */
function knockOnEntry(): PlanSlice {
  const id = ctx.id;
  return {
    slice: id('D'), name: 'Forklift tracking', tenantId: quayTenantId, critical: false, priority: 4, sst: 3, reasons: [], outcome: 'move',
    moves: [{ function: id('fd1'), from: id('X3'), to: id('X2') }], reroutes: [{ tie: id('td'), from: [id('s2')], to: [] }],
    before: { sites: { [id('fd1')]: id('X3'), [id('fd2')]: id('X2') }, paths: { [id('td')]: [id('s2')] } },
    after: { sites: { [id('fd1')]: id('X2'), [id('fd2')]: id('X2') }, paths: { [id('td')]: [] } },
    unresolvedReason: null, madeRoomFor: [{ slice: id('A'), name: 'Port cranes' }],
  };
}

beforeAll(async () => {
  ctx = await setupNoticesApp();
  quayTenantId = await insertQuayTenant();
});
afterAll(async () => { await ctx.close(); });

describe('issueNotices with a knock-on move', () => {
  let windowId: string;
  const rowsOf = () => ctx.db.select().from(notices).where(eq(notices.windowId, windowId));
  const quayRow = async () => (await rowsOf()).find((r) => r.tenantId === quayTenantId)!;

  // Each test issues notices for a window of its own, so any one of them can run alone.
  let made = 0;
  beforeEach(async () => {
    windowId = await insertClearedWindow(ctx, `knock-on-${++made}`, 20, [...planSlices(ctx.id, ctx.tenantId, ctx.otherTenantId), knockOnEntry()]);
    ctx.queue.mails.length = 0;
    await ctx.db.transaction((tx) => issueNotices(tx, { jobs: ctx.queue, config: ctx.config, now: NOW }, windowId, ctx.users.planner.id));
  });

  it('the knock-on slice’s tenant gets a notice and a mail with the invitation, like every affected tenant', async () => {
    expect((await rowsOf()).map((r) => r.tenantId).sort()).toEqual([ctx.tenantId, ctx.otherTenantId, quayTenantId].sort());
    const row = await quayRow();
    expect([row.status, row.method, row.sequence]).toEqual(['queued', 'REQUEST', 0]);
    const mail = ctx.queue.mails.find((m) => m.to.includes(`desk.${ctx.prefix}@quay.example`))!;
    expect(mail.calendar?.method).toBe('REQUEST');
    expectRfc5545Event(parseInvitation(row.ics));
    const [w] = await ctx.db.select({ status: windows.status }).from(windows).where(eq(windows.id, windowId));
    expect(w.status).toBe('notified');
  });

  it('says the slice is moved to make room during planned work, hitless, in tenant-facing words', async () => {
    const content = noticeContentSchema.parse((await quayRow()).content);
    expect(content.slices).toHaveLength(1);
    const d = content.slices[0];
    expect(d).toMatchObject({ name: 'Forklift tracking', outcome: 'move', effect: 'hitless' });
    expect(d.changes[0]).toBe('The planned work does not touch this slice itself; it is moved to make room for other services during the work.');
    expect(d.changes).toContain('Function "Tracker hub" moves to another site 16 km away.');
    expect(content.effect).toBe('hitless');
  });

  it('never reveals the other tenants’ slices, nor internal sites, spans or the window title', async () => {
    const [w] = await ctx.db.select({ title: windows.title }).from(windows).where(eq(windows.id, windowId));
    const row = await quayRow();
    const everything = [JSON.stringify(row.content), row.subject, row.body, row.ics].join('\n');
    const hidden = ['Port cranes', 'Harbour pilots', 'Yard cameras', ctx.id('A'), ctx.id('B'), ctx.id('C'), ...internalNames(ctx.id), w.title];
    for (const text of hidden) expect(everything).not.toContain(text);
    expect(row.body).toMatch(/make room for other services/);
  });
});

describe('describeSlice for a knock-on move', () => {
  const look = { sites: new Map(), spanLatencyMs: new Map(), functionNames: new Map(), ties: new Map() };
  const entry = (madeRoomFor: PlanSlice['madeRoomFor'], outcome: PlanSlice['outcome'] = 'reroute'): PlanSlice => ({
    slice: 'k', name: 'Kiosk', tenantId: 't', critical: false, priority: 3, sst: 1, reasons: [], outcome, moves: [], reroutes: [],
    before: { sites: {}, paths: {} }, after: { sites: {}, paths: {} }, unresolvedReason: null, madeRoomFor,
  });
  const first = (s: PlanSlice, own: string[]) => describeSlice(s, look, new Set(), 'then', new Set(own)).changes[0];

  it('names the tenant’s own slices and only those; others are "other services"', () => {
    expect(first(entry([{ slice: 'a', name: 'Ours' }]), ['k', 'a'])).toBe(
      'The planned work does not touch this slice itself; it is rerouted to make room for your slice "Ours" during the work.');
    expect(first(entry([{ slice: 'a', name: 'Ours' }, { slice: 'x', name: 'Theirs' }]), ['k', 'a'])).toBe(
      'The planned work does not touch this slice itself; it is rerouted to make room for your slice "Ours" and other services during the work.');
    expect(first(entry([{ slice: 'x', name: 'Theirs' }], 'move'), ['k'])).not.toContain('Theirs');
  });

  it('adds nothing for the window’s own affected slices', () => {
    expect(describeSlice(entry([]), look, new Set(), 'then').changes).toEqual([]);
  });
});
