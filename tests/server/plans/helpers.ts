// Plans API test harness: a scratch database of its own, a recording job queue, a small network whose windows
// force reroutes over one thin backup span, and finished plan runs computed in the test (no worker).
import { plans, placements, sites, sliceFunctions, sliceTies, slices, spans, tenants } from '../../../db/schema';
import { buildInventory } from '../../../planner/model/build-inventory';
import { computePlan } from '../../../server/jobs/plan-compute';
import { scenarioWindowOf } from '../../../server/services/windows/window-spec';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { reservationsFor } from '../../../server/services/plans/reservations';
import { loadWindow } from '../../../server/services/windows/window-view';
import { planSettingsSchema, type PlanReview, type PlanSettingsInput } from '../../../shared/plans';
import { createRecordingQueue, type RecordingQueue } from '../helpers/jobs';
import { removePrefixed } from '../helpers/remove-prefixed';
import { useScratchDatabase } from '../helpers/scratch-database';
import { signedInRequests, type AsUser } from '../helpers/sign-in';
import { setupTestApp, type TestContext } from '../helpers/test-app';

export type PlansContext = TestContext & {
  /** records what the API enqueued; runs nothing */
  queue: RecordingQueue;
  as: AsUser<keyof TestContext['users']>;
  cleanup: () => Promise<void>;
};

/** Plans tests load the whole inventory (assess, accept), so they run in a scratch database of their own. */
export async function setupPlansApp(now: Date): Promise<PlansContext> {
  await useScratchDatabase('plansapi');
  const ctx = await setupTestApp();
  const queue = createRecordingQueue();
  const app = ctx.makeApp({ now: () => now, jobs: queue });
  const as: PlansContext['as'] = signedInRequests(app, (role) => ctx.users[role].email);
  const cleanup = () => removePrefixed(ctx.pool, ctx.prefix, [['windows', ['title', 'owner_id']]]);
  return { ...ctx, app, queue, as, cleanup };
}

/** The plans app with the backup network below inserted: what every plans test file starts from. */
export async function setupPlansNetwork(now: Date): Promise<{ ctx: PlansContext; id: (name: string) => string }> {
  const ctx = await setupPlansApp(now);
  const { id } = await insertBackupNetwork(ctx);
  return { ctx, id };
}

export async function closePlansApp(ctx: PlansContext): Promise<void> {
  await ctx.cleanup();
  await ctx.close();
}

/**
 *   A ──p1── B        S1 (own tenant, priority 1): f1 on A, f2 on B (both fixed), tie e1 1 Gbit/s over p1
 *   │        │        S2 (other tenant, priority 2): g1 on C, g2 on D (both fixed), tie e2 1 Gbit/s over p2
 *   a1       b2       S3 (own tenant, priority 3): h1 on E (movable), h2 on A (fixed), tie e3 over ea
 *   │        │
 *   H1 ─bk── H2       bk carries 1.5 Gbit/s: one rerouted slice fits, two do not.
 *   │        │
 *   c1       d2       E ─ea─ A (E only reaches the rest through A)
 *   │        │
 *   C ──p2── D
 * Inserted in one transaction so parallel files never see half of it.
 */
export async function insertBackupNetwork(ctx: TestContext) {
  const id = (name: string) => `${ctx.prefix}-${name}`;
  const otherTenantId = id('other-tenant');
  await ctx.db.transaction(async (tx) => {
    await tx.insert(tenants).values({ id: otherTenantId, name: `${ctx.prefix} Other`, noticeDays: 3 });
    await tx.insert(sites).values(['A', 'B', 'C', 'D', 'E', 'H1', 'H2'].map((s, i) => ({
      id: id(s), name: `Site ${s}`, kind: 'edge' as const, lat: 20 + i / 100, lon: 20, cpu: 16,
    })));
    const links: [string, string, string, number][] = [['p1', 'A', 'B', 10], ['p2', 'C', 'D', 10], ['a1', 'A', 'H1', 10],
      ['b2', 'H2', 'B', 10], ['c1', 'C', 'H1', 10], ['d2', 'H2', 'D', 10], ['bk', 'H1', 'H2', 1.5], ['ea', 'E', 'A', 10]];
    await tx.insert(spans).values(links.map(([k, a, b, gbps]) => ({ id: id(k), siteA: id(a), siteB: id(b), capacityGbps: gbps, lengthKm: 10 })));
    await tx.insert(slices).values([
      { id: id('S1'), tenantId: ctx.tenantId, name: 'Own control', sst: 2, priority: 1 },
      { id: id('S2'), tenantId: otherTenantId, name: 'Other video', sst: 1, priority: 2 },
      { id: id('S3'), tenantId: ctx.tenantId, name: 'Own edge', sst: 1, priority: 3 },
    ]);
    await tx.insert(sliceFunctions).values([
      { id: id('f1'), sliceId: id('S1'), cpu: 2, fixed: true }, { id: id('f2'), sliceId: id('S1'), cpu: 2, fixed: true },
      { id: id('g1'), sliceId: id('S2'), cpu: 2, fixed: true }, { id: id('g2'), sliceId: id('S2'), cpu: 2, fixed: true },
      { id: id('h1'), sliceId: id('S3'), cpu: 2 }, { id: id('h2'), sliceId: id('S3'), cpu: 2, fixed: true },
    ]);
    await tx.insert(sliceTies).values([
      { id: id('e1'), sliceId: id('S1'), fromFunction: id('f1'), toFunction: id('f2'), bandwidthGbps: 1, maxLatencyMs: 50 },
      { id: id('e2'), sliceId: id('S2'), fromFunction: id('g1'), toFunction: id('g2'), bandwidthGbps: 1, maxLatencyMs: 50 },
      { id: id('e3'), sliceId: id('S3'), fromFunction: id('h1'), toFunction: id('h2'), bandwidthGbps: 0.5, maxLatencyMs: 50 },
    ]);
    await tx.insert(placements).values([
      { sliceId: id('S1'), revision: 1, sites: { [id('f1')]: id('A'), [id('f2')]: id('B') }, paths: { [id('e1')]: [id('p1')] } },
      { sliceId: id('S2'), revision: 1, sites: { [id('g1')]: id('C'), [id('g2')]: id('D') }, paths: { [id('e2')]: [id('p2')] } },
      { sliceId: id('S3'), revision: 1, sites: { [id('h1')]: id('E'), [id('h2')]: id('A') }, paths: { [id('e3')]: [id('ea')] } },
    ]);
  });
  return { id, otherTenantId };
}

export type Element = { kind: 'site' | 'span'; id: string; effect: 'down' | 'reduced'; fraction?: number };

/** Books a window through the API and assesses it (planner); returns its id. */
export async function bookAssessed(ctx: PlansContext, title: string, startsAt: string, endsAt: string, elements: Element[]): Promise<string> {
  const planner = await ctx.as('planner');
  const booked = await planner('post', '/api/windows').send({ title: `${ctx.prefix} ${title}`, startsAt, endsAt, workType: 'fibre splice', elements });
  if (booked.status !== 201) throw new Error(`booking failed: ${booked.status} ${JSON.stringify(booked.body)}`);
  const id = booked.body.window.id as string;
  const assessed = await planner('post', `/api/windows/${id}/assess`).send({});
  if (assessed.status !== 200) throw new Error(`assessing failed: ${assessed.status} ${JSON.stringify(assessed.body)}`);
  return id;
}

/**
 * Computes a plan for the window as the worker would (computePlan on the current inventory, with or without the
 * reservations of other accepted plans) and stores it as a finished run made for the window's current version.
 */
export async function storeFinishedPlan(
  ctx: TestContext, windowId: string, opts: { settings?: PlanSettingsInput; reserve?: boolean } = {},
): Promise<{ planId: string; review: PlanReview }> {
  const settings = planSettingsSchema.parse({ timeLimitSeconds: 1, ...opts.settings });
  const current = await loadNetworkScenario(ctx.db);
  const scenario = { ...current, windows: [scenarioWindowOf(await loadWindow(ctx.db, windowId, null))] };
  const held = opts.reserve === false
    ? { reservations: {}, reservedFor: [] }
    : await reservationsFor(ctx.db, windowId, () => buildInventory(current));
  const review = await computePlan({ scenario, windowId, settings, ...held }, () => undefined);
  const [w] = (await ctx.pool.query('select version from windows where id = $1', [windowId])).rows;
  const planId = `pl-${ctx.prefix}-${Math.random().toString(36).slice(2, 10)}`;
  const at = new Date();
  await ctx.db.insert(plans).values({
    id: planId, windowId, windowVersion: w.version, status: 'done', settings, result: review, attempts: 1,
    createdBy: ctx.users.planner.id, createdAt: at, startedAt: at, finishedAt: at,
  });
  return { planId, review };
}

export async function windowRow(ctx: TestContext, windowId: string) {
  const { rows } = await ctx.pool.query('select status, version, accepted_plan_id from windows where id = $1', [windowId]);
  return rows[0] as { status: string; version: number; accepted_plan_id: string | null };
}
