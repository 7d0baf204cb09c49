// Notices test harness: a scratch database of its own (policies there are ours alone), a queue that records
// mails, two tenants' slices and cleared windows whose accepted plans are inserted directly (no worker).
//
//   X1 ──s1 (1.2 ms)── X2     own tenant:   slice A moves fa1 X1 → X2 (≈ 11 km); tie ta rerouted s3 → s2 (3.0 → 1.5 ms)
//    \                 /                    slice B (critical) stays, without its backup path (unprotected)
//   s3 (3.0 ms)   s2 (1.5 ms)    other tenant: slice C unresolved, outage accepted
//          \       /
//             X3
import { eq } from 'drizzle-orm';
import { placements, plans, sites, sliceFunctions, sliceTies, slices, spans, tenants, windowElements, windows } from '../../../db/schema';
import { planReviewSchema, planSettingsSchema, type PlanSlice } from '../../../shared/plans';
import { createRecordingQueue, type RecordingQueue } from '../helpers/jobs';
import { useScratchDatabase } from '../helpers/scratch-database';
import { signedInRequests, type AsUser } from '../helpers/sign-in';
import { insertUser, setupTestApp, type TestContext } from '../helpers/test-app';

export const NOW = new Date('2031-05-01T08:00:00Z');
export const DAY_MS = 86_400_000;

type Role = keyof TestContext['users'] | 'otherTenant';

export type NoticesContext = TestContext & {
  /** records every mail; runs nothing */
  queue: RecordingQueue;
  id: (name: string) => string;
  otherTenantId: string;
  otherTenantUser: { id: string; email: string };
  as: AsUser<Role>;
};

async function insertOtherTenantUser(ctx: TestContext, otherTenantId: string) {
  const user = { id: `${ctx.prefix}-other-tenant-user`, email: `other-tenant.${ctx.prefix}@test.example` };
  await insertUser(ctx.db, { ...user, name: 'Other tenant user', tenantId: otherTenantId, roles: ['tenant'] });
  return user;
}

export async function setupNoticesApp(): Promise<NoticesContext> {
  await useScratchDatabase('notices');
  const ctx = await setupTestApp();
  const queue = createRecordingQueue();
  const app = ctx.makeApp({ now: () => NOW, jobs: queue });
  const id = (name: string) => `${ctx.prefix}-${name}`;
  const otherTenantId = await insertNetwork(ctx, id);
  const otherTenantUser = await insertOtherTenantUser(ctx, otherTenantId);
  const as: NoticesContext['as'] = signedInRequests(app, (role) => (role === 'otherTenant' ? otherTenantUser.email : ctx.users[role].email));
  return { ...ctx, app, queue, id, otherTenantId, otherTenantUser, as };
}

/** Site names and ids the tenants must never read. */
export function internalNames(id: (name: string) => string): string[] {
  return ['X1', 'X2', 'X3'].flatMap((s) => [id(s), `Hidden Point ${s}`]).concat(['s1', 's2', 's3'].map(id));
}

async function insertNetwork(ctx: TestContext, id: (name: string) => string): Promise<string> {
  const otherTenantId = id('other-tenant');
  await ctx.db.transaction(async (tx) => {
    await tx.insert(tenants).values({
      id: otherTenantId, name: 'Other Harbour Co', noticeDays: 3,
      contacts: [{ name: 'Harbour desk', email: `desk.${ctx.prefix}@other.example` }],
    });
    await tx.insert(sites).values([['X1', 10, 10], ['X2', 10.1, 10], ['X3', 10, 10.1]].map(([s, lat, lon]) => ({
      id: id(String(s)), name: `Hidden Point ${s}`, kind: 'edge' as const, lat: Number(lat), lon: Number(lon), cpu: 16,
    })));
    await tx.insert(spans).values([['s1', 'X1', 'X2', 1.2], ['s2', 'X2', 'X3', 1.5], ['s3', 'X1', 'X3', 3.0]].map(([k, a, b, ms]) => ({
      id: id(String(k)), siteA: id(String(a)), siteB: id(String(b)), capacityGbps: 10, lengthKm: 10, latencyMs: Number(ms),
    })));
    await tx.insert(slices).values([
      { id: id('A'), tenantId: ctx.tenantId, name: 'Port cranes', sst: 2, priority: 1 },
      { id: id('B'), tenantId: ctx.tenantId, name: 'Harbour pilots', sst: 2, priority: 1, critical: true },
      { id: id('C'), tenantId: otherTenantId, name: 'Yard cameras', sst: 1, priority: 3 },
    ]);
    await tx.insert(sliceFunctions).values([
      { id: id('fa1'), sliceId: id('A'), name: 'Crane gateway', cpu: 2 }, { id: id('fa2'), sliceId: id('A'), name: 'Crane control', cpu: 2 },
      { id: id('fb1'), sliceId: id('B'), name: 'Pilot gateway', cpu: 2 }, { id: id('fb2'), sliceId: id('B'), cpu: 2 },
      { id: id('fc1'), sliceId: id('C'), name: 'Camera hub', cpu: 2 }, { id: id('fc2'), sliceId: id('C'), cpu: 2 },
    ]);
    await tx.insert(sliceTies).values([
      { id: id('ta'), sliceId: id('A'), fromFunction: id('fa1'), toFunction: id('fa2'), bandwidthGbps: 1, maxLatencyMs: 10 },
      { id: id('tb'), sliceId: id('B'), fromFunction: id('fb1'), toFunction: id('fb2'), bandwidthGbps: 1, maxLatencyMs: 10 },
      { id: id('tc'), sliceId: id('C'), fromFunction: id('fc1'), toFunction: id('fc2'), bandwidthGbps: 1, maxLatencyMs: 10 },
    ]);
    await tx.insert(placements).values([
      { sliceId: id('A'), revision: 1, sites: { [id('fa1')]: id('X1'), [id('fa2')]: id('X3') }, paths: { [id('ta')]: [id('s3')] } },
      { sliceId: id('B'), revision: 1, sites: { [id('fb1')]: id('X2'), [id('fb2')]: id('X3') }, paths: { [id('tb')]: [id('s2')] } },
      { sliceId: id('C'), revision: 1, sites: { [id('fc1')]: id('X1'), [id('fc2')]: id('X1') }, paths: { [id('tc')]: [] } },
    ]);
  });
  await ctx.db.update(tenants).set({ contacts: [{ name: 'Ops desk', email: `ops.${ctx.prefix}@own.example` }] })
    .where(eq(tenants.id, ctx.tenantId));
  return otherTenantId;
}

export function planSlices(id: (name: string) => string, ownTenantId: string, otherTenantId: string): PlanSlice[] {
  const none = { before: { sites: {}, paths: {} }, after: { sites: {}, paths: {} }, unresolvedReason: null, madeRoomFor: [] };
  return [
    { slice: id('A'), name: 'Port cranes', tenantId: ownTenantId, critical: false, priority: 1, sst: 2, reasons: ['hosted'], outcome: 'move',
      moves: [{ function: id('fa1'), from: id('X1'), to: id('X2') }],
      reroutes: [{ tie: id('ta'), from: [id('s3')], to: [id('s2')] }], ...none },
    { slice: id('B'), name: 'Harbour pilots', tenantId: ownTenantId, critical: true, priority: 1, sst: 2, reasons: ['unprotected'],
      outcome: 'stays', moves: [], reroutes: [], ...none },
    { slice: id('C'), name: 'Yard cameras', tenantId: otherTenantId, critical: false, priority: 3, sst: 1, reasons: ['hosted'],
      outcome: 'unresolved', moves: [], reroutes: [], ...none, after: null, unresolvedReason: 'no site within the anchor radius' },
  ];
}

function reviewOf(slices: PlanSlice[]) {
  const objective = { unresolvedWeight: 1, unresolved: 1, moved: 1, rerouted: 1, moveCost: 1, usage: 1, peakUtilisation: 0.5 };
  const reference = { solver: 'greedy' as const, objective, elapsedMs: 1, optimal: null, gap: null, bound: null, note: null };
  return planReviewSchema.parse({
    // knock-on moves (madeRoomFor) are entries for slices the window does not affect
    affected: slices.filter((s) => s.madeRoomFor.length === 0).map((s) => s.slice), objective,
    totals: { stays: 1, moved: 1, rerouted: 0, unresolved: 1, moveCost: 1 },
    slices, steps: [], needsSpare: 0, risk: [], trace: [], greedy: reference, exact: null, reservedFor: [], computeMs: 5,
  });
}

/** A cleared window taking X1 down `startDays` after NOW, with an accepted plan (planSlices unless given); returns its id. */
export async function insertClearedWindow(ctx: NoticesContext, key: string, startDays: number, planned?: PlanSlice[]): Promise<string> {
  const windowId = ctx.id(`w-${key}`);
  const planId = ctx.id(`plan-${key}`);
  const startsAt = new Date(NOW.getTime() + startDays * DAY_MS);
  await ctx.db.transaction(async (tx) => {
    await tx.insert(windows).values({
      id: windowId, title: `Fibre splice, Hidden Point X1 to Hidden Point X2 (${ctx.prefix})`, workType: 'fibre splice',
      startsAt, endsAt: new Date(startsAt.getTime() + 4 * 3_600_000), status: 'cleared', reviewRound: 1,
    });
    await tx.insert(windowElements).values({ windowId, elementKind: 'site', elementId: ctx.id('X1'), effect: 'down' });
    await tx.insert(plans).values({
      id: planId, windowId, windowVersion: 1, status: 'done', settings: planSettingsSchema.parse({ afterWindow: 'return' }),
      result: reviewOf(planned ?? planSlices(ctx.id, ctx.tenantId, ctx.otherTenantId)), outageAccepted: [ctx.id('C')],
      acceptedAt: NOW, createdAt: NOW, finishedAt: NOW,
    });
    await tx.update(windows).set({ acceptedPlanId: planId }).where(eq(windows.id, windowId));
  });
  return windowId;
}
