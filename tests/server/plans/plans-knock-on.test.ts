// A plan with a knock-on move (hand-made until the planner core produces them): S4, which the window does not
// touch, is rerouted off the thin backup span so that S1 fits there. Accepting re-verifies it, the move holds
// capacity against overlapping windows, and the work applies and returns it like any move.
import { plans, placements, sliceFunctions, sliceTies, slices } from '../../../db/schema';
import type { PlanResult } from '../../../planner/model/types';
import { buildReview } from '../../../planner/review/build-review';
import { loadInventory } from '../helpers/load-inventory';
import { reservationsFor } from '../../../server/services/plans/reservations';
import { windowSpecOf } from '../../../server/services/windows/window-spec';
import { loadWindow } from '../../../server/services/windows/window-view';
import { planSettingsSchema, type PlanReview } from '../../../shared/plans';
import { bookAssessed, closePlansApp, setupPlansNetwork, windowRow, type PlansContext } from './helpers';

// This file books in August 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;

/** S4 (other tenant): k1 on H1, k2 on H2 (both fixed), 1 Gbit/s over bk — with S1 rerouted there, bk (1.5) is full. */
async function insertBlocker() {
  await ctx.db.transaction(async (tx) => {
    await tx.insert(slices).values({ id: id('S4'), tenantId: id('other-tenant'), name: 'Other sensors', sst: 3, priority: 4 });
    await tx.insert(sliceFunctions).values([
      { id: id('k1'), sliceId: id('S4'), cpu: 1, fixed: true }, { id: id('k2'), sliceId: id('S4'), cpu: 1, fixed: true },
    ]);
    await tx.insert(sliceTies).values({ id: id('e4'), sliceId: id('S4'), fromFunction: id('k1'), toFunction: id('k2'), bandwidthGbps: 1, maxLatencyMs: 50 });
    await tx.insert(placements).values({ sliceId: id('S4'), revision: 1, sites: { [id('k1')]: id('H1'), [id('k2')]: id('H2') }, paths: { [id('e4')]: [id('bk')] } });
  });
}

beforeAll(async () => {
  ({ ctx, id } = await setupPlansNetwork(NOW));
  await insertBlocker();
});
afterAll(() => closePlansApp(ctx));

const ref = { solver: 'greedy' as const, objective: null, elapsedMs: 1, optimal: null, gap: null, bound: null, note: 'test' };

/** p1 down: S1 takes a1–bk–b2; S4 moves from bk to c1–p2–d2 to make room. Stored as a finished run of the window. */
async function storeKnockOnPlan(windowId: string): Promise<{ planId: string; review: PlanReview }> {
  const { scenario, inventory } = await loadInventory(ctx.db);
  const spec = windowSpecOf(await loadWindow(ctx.db, windowId, null));
  const objective = { unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 2, moveCost: 2, usage: 1, peakUtilisation: 1 };
  const result: PlanResult = {
    window: windowId, mode: 'serial', seed: 1, elapsedMs: 1, affected: [id('S1')], objective, trace: [],
    slices: [
      { slice: id('S1'), outcome: 'reroute', sites: { [id('f1')]: id('A'), [id('f2')]: id('B') }, paths: { [id('e1')]: [id('a1'), id('bk'), id('b2')] } },
      {
        slice: id('S4'), outcome: 'reroute', sites: { [id('k1')]: id('H1'), [id('k2')]: id('H2') },
        paths: { [id('e4')]: [id('c1'), id('p2'), id('d2')] }, madeRoomFor: [id('S1')],
      },
    ],
  };
  const names = new Map(scenario.slices.map((s) => [s.id, s.name]));
  const review = buildReview(inventory, spec, result, { greedy: ref, exact: null, computeMs: 1, names });
  const [w] = (await ctx.pool.query('select version from windows where id = $1', [windowId])).rows;
  const planId = `pl-${ctx.prefix}-${windowId.slice(-8)}`;
  await ctx.db.insert(plans).values({
    id: planId, windowId, windowVersion: w.version, status: 'done', settings: planSettingsSchema.parse({ afterWindow: 'return' }),
    result: review, attempts: 1, createdBy: ctx.users.planner.id, createdAt: NOW, startedAt: NOW, finishedAt: NOW,
  });
  return { planId, review };
}

async function currentPath(slice: string, tie: string): Promise<string[]> {
  const { rows } = await ctx.pool.query('select paths from placements where slice_id = $1 and current', [slice]);
  return rows[0].paths[tie];
}

test('a valid knock-on plan is accepted, holds capacity for overlapping windows, and is applied and returned', async () => {
  const w = await bookAssessed(ctx, 'knock-on', '2027-08-02T22:00:00Z', '2027-08-03T02:00:00Z', [{ kind: 'span', id: id('p1'), effect: 'down' }]);
  const { planId, review } = await storeKnockOnPlan(w);
  expect(review.affected).toEqual([id('S1')]);
  expect(review.slices.find((s) => s.slice === id('S4'))!.madeRoomFor).toEqual([{ slice: id('S1'), name: 'Own control' }]);
  expect(review.steps.map((s) => [s.slice, s.knockOn])).toEqual([[id('S4'), true], [id('S1'), false]]);

  const accepted = await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({});
  expect([accepted.status, accepted.body.error]).toEqual([200, undefined]);
  expect(await windowRow(ctx, w)).toMatchObject({ status: 'planned', accepted_plan_id: planId });

  // An overlapping window sees both moves' additions held, the knock-on one included.
  const other = await bookAssessed(ctx, 'overlap', '2027-08-03T00:00:00Z', '2027-08-03T03:00:00Z', [{ kind: 'site', id: id('E'), effect: 'down' }]);
  const held = await reservationsFor(ctx.db, other);
  expect(held.reservedFor).toEqual([w]);
  for (const span of ['a1', 'bk', 'b2', 'c1', 'p2', 'd2']) expect([span, held.reservations.spanGbps?.[id(span)]]).toEqual([span, 1]);

  await ctx.pool.query(`update windows set status = 'notified' where id = $1`, [w]);
  const move = async (to: string) => {
    const { version } = await windowRow(ctx, w);
    expect((await (await ctx.as('engineer'))('post', `/api/windows/${w}/transition`).send({ to, version })).status).toBe(200);
  };
  await move('underway');
  expect(await currentPath(id('S4'), id('e4'))).toEqual([id('c1'), id('p2'), id('d2')]);
  expect(await currentPath(id('S1'), id('e1'))).toEqual([id('a1'), id('bk'), id('b2')]);
  await move('done');
  expect(await currentPath(id('S4'), id('e4'))).toEqual([id('bk')]);
});

test('a knock-on entry that no longer names whom it makes room for is refused on accept', async () => {
  const w = await bookAssessed(ctx, 'knock-on bare', '2027-08-10T22:00:00Z', '2027-08-11T02:00:00Z', [{ kind: 'span', id: id('p1'), effect: 'down' }]);
  const { planId, review } = await storeKnockOnPlan(w);
  const bare = { ...review, slices: review.slices.map((s) => ({ ...s, madeRoomFor: [] })) };
  await ctx.pool.query('update plans set result = $2 where id = $1', [planId, JSON.stringify(bare)]);
  const res = await (await ctx.as('planner'))('post', `/api/plans/${planId}/accept`).send({});
  expect(res.status).toBe(409);
  expect(res.body.error.code).toBe('PLAN_NO_LONGER_FITS');
  expect(res.body.error.message).toContain(id('S4'));
});
