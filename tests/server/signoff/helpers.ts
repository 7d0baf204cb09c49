// Sign-off API test harness: a scratch database per test file (policies are global and some files change them),
// extra approvers, a recording job queue, a settable clock, and planned windows with hand-made accepted plans.
import { plans, sites, slices, tenants, windowElements, windows } from '../../../db/schema';
import { hashPassword } from '../../../server/auth/password';
import { planReviewSchema, type PlanReview, type PlanSlice } from '../../../shared/plans';
import { createRecordingQueue, type RecordingQueue } from '../helpers/jobs';
import { removePrefixed } from '../helpers/remove-prefixed';
import { useScratchDatabase } from '../helpers/scratch-database';
import { signedInRequests, type AsUser } from '../helpers/sign-in';
import { insertUser, setupTestApp, TEST_PASSWORD, type TestContext } from '../helpers/test-app';

export const EXTRA_APPROVERS = ['approver2', 'approver3'] as const;
type Who = keyof TestContext['users'] | (typeof EXTRA_APPROVERS)[number];

export type SignoffTestContext = TestContext & {
  clock: { now: Date };
  /** records every call; nothing is sent */
  recorded: RecordingQueue;
  userId: (who: Who) => string;
  as: AsUser<Who>;
  cleanup: () => Promise<void>;
};

export async function setupSignoffApp(suffix: string, now: Date): Promise<SignoffTestContext> {
  await useScratchDatabase(`signoff_${suffix}`);
  const ctx = await setupTestApp();
  // The database is this file's alone, but it outlives a run: start every run from the default policies.
  await ctx.pool.query(`delete from policies where key like 'signoff%'`);
  const passwordHash = await hashPassword(TEST_PASSWORD);
  for (const key of EXTRA_APPROVERS) {
    const user = { id: `${ctx.prefix}-${key}`, email: `${key}.${ctx.prefix}@test.example`, name: `Approver ${key}` };
    await insertUser(ctx.db, { ...user, roles: ['approver'] }, passwordHash);
  }
  const clock = { now };
  const recorded = createRecordingQueue();
  const app = ctx.makeApp({ now: () => clock.now, jobs: recorded });
  const emailOf = (who: Who) => (who in ctx.users ? ctx.users[who as keyof TestContext['users']].email : `${who}.${ctx.prefix}@test.example`);
  const userId = (who: Who) => (who in ctx.users ? ctx.users[who as keyof TestContext['users']].id : `${ctx.prefix}-${who}`);
  const as = signedInRequests(app, emailOf);
  const cleanup = () => removePrefixed(ctx.pool, ctx.prefix, [['signoffs', ['window_id']], ['windows', ['id']]]);
  return { ...ctx, app, clock, recorded, userId, as, cleanup };
}

export type PlanShape = {
  critical?: boolean; severity?: 'low' | 'medium' | 'high' | 'critical'; unresolved?: boolean;
  /** adds s5: the other tenant's slice, which the window does not touch, moved to make room for s1 */
  knockOn?: boolean;
};
type WindowOptions = PlanShape & { key: string; ownerId?: string; planCreatedBy?: string; acceptedBy?: string };

function slice(ctx: TestContext, key: string, outcome: PlanSlice['outcome'], critical: boolean, tenantId = ctx.tenantId): PlanSlice {
  const id = `${ctx.prefix}-${key}`;
  const placed = { sites: { [`${id}-f1`]: `${ctx.prefix}-A` }, paths: {} };
  return {
    slice: id, name: `Slice ${key}`, tenantId, critical, priority: 2, sst: critical ? 2 : 1, reasons: ['hosted'], outcome,
    moves: outcome === 'move' ? [{ function: `${id}-f1`, from: `${ctx.prefix}-A`, to: `${ctx.prefix}-B` }] : [], reroutes: [],
    before: placed, after: outcome === 'unresolved' ? null : { sites: { [`${id}-f1`]: `${ctx.prefix}-B` }, paths: {} },
    unresolvedReason: outcome === 'unresolved' ? 'no site within the anchor radius has 4 vCPU free' : null,
    madeRoomFor: [],
  };
}

/** A finished review (shared/plans.ts shape): two moving slices, one staying, optionally an unresolved one. */
export function makeReview(ctx: TestContext, key: string, shape: PlanShape): PlanReview {
  const objective = { unresolvedWeight: 0, unresolved: 0, moved: 2, rerouted: 0, moveCost: 2, usage: 1, peakUtilisation: 0.4 };
  const list = [
    slice(ctx, `${key}-s1`, 'move', shape.critical ?? false), slice(ctx, `${key}-s2`, 'move', false, `${ctx.prefix}-other`),
    slice(ctx, `${key}-s3`, 'stays', false), ...(shape.unresolved ? [slice(ctx, `${key}-s4`, 'unresolved', false)] : []),
  ];
  const knockOn = shape.knockOn
    ? [{ ...slice(ctx, `${key}-s5`, 'move', false, `${ctx.prefix}-other`), reasons: [], madeRoomFor: [{ slice: list[0].slice, name: list[0].name }] }]
    : [];
  return planReviewSchema.parse({
    affected: list.map((s) => s.slice), objective,
    totals: { stays: 1, moved: 2, rerouted: 0, unresolved: shape.unresolved ? 1 : 0, moveCost: 2 },
    slices: [...list, ...knockOn], steps: [], needsSpare: 0,
    risk: list.map((s, i) => ({ slice: s.slice, failureProbability: 1e-4 * (i + 1), unprotected: false, severity: i === 0 ? shape.severity ?? 'low' : 'low' })),
    trace: [], greedy: { solver: 'greedy', objective, elapsedMs: 1, optimal: null, gap: null, bound: null, note: null },
    exact: null, reservedFor: [], computeMs: 10,
  });
}

/** Inserts sites, slices, a `planned` window owned by `ownerId` and its accepted plan; returns the ids. */
export async function insertPlannedWindow(ctx: SignoffTestContext, o: WindowOptions): Promise<{ windowId: string; planId: string; review: PlanReview }> {
  const p = ctx.prefix;
  await ctx.db.insert(tenants).values({ id: `${p}-other`, name: `${p} Other tenant`, noticeDays: 2, contacts: [{ name: 'Ops', email: `ops.${p}@test.example` }] }).onConflictDoNothing();
  await ctx.db.insert(sites).values(['A', 'B'].map((s) => ({ id: `${p}-${s}`, name: `Site ${s}`, kind: 'edge' as const, lat: 1, lon: 1, cpu: 16 }))).onConflictDoNothing();
  const review = makeReview(ctx, o.key, o);
  await ctx.db.insert(slices).values(review.slices.map((s) => ({ id: s.slice, tenantId: s.tenantId, name: s.name, sst: s.sst, priority: s.priority, critical: s.critical })));
  const windowId = `${p}-w-${o.key}`;
  const planId = `${p}-pl-${o.key}`;
  const startsAt = new Date(ctx.clock.now.getTime() + 20 * 86_400_000);
  await ctx.db.insert(windows).values({ id: windowId, title: `${p} window ${o.key}`, startsAt, endsAt: new Date(startsAt.getTime() + 4 * 3_600_000), workType: 'fibre splice', status: 'planned', ownerId: o.ownerId ?? ctx.users.engineer.id, acceptedPlanId: planId });
  await ctx.db.insert(windowElements).values({ windowId, elementKind: 'site', elementId: `${p}-A`, effect: 'down' });
  await ctx.db.insert(plans).values({
    id: planId, windowId, windowVersion: 1, status: 'done', settings: { mode: 'serial', seed: 1, population: 40, timeLimitSeconds: 20, pinned: [], excludedSites: [], afterWindow: 'return' },
    result: review, createdBy: o.planCreatedBy ?? ctx.users.planner.id, acceptedBy: o.acceptedBy ?? ctx.users.planner.id,
    acceptedAt: ctx.clock.now, outageAccepted: review.slices.filter((s) => s.outcome === 'unresolved').map((s) => s.slice),
  });
  return { windowId, planId, review };
}

export async function windowStatus(ctx: TestContext, windowId: string): Promise<string> {
  return (await ctx.pool.query('select status from windows where id = $1', [windowId])).rows[0].status;
}
