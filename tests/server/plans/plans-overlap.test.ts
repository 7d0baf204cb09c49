// Two windows overlapping in time, planned one after the other, never double-book capacity: the second run holds
// back what the first window's accepted plan uses, and a second plan made without that is refused at accept.
import { fits } from '../../../planner/model/tolerance';
import type { Inventory, SlicePlacement, WindowSpec } from '../../../planner/model/types';
import { addPlacementLoad, placementLoad, windowCapacity } from '../../../planner/model/window-capacity';
import { fromSlicePlans } from '../../../planner/plan/slice-plans';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import { loadInventory } from '../helpers/load-inventory';
import { reservationsFor, toSlicePlan } from '../../../server/services/plans/reservations';
import { windowSpecOf } from '../../../server/services/windows/window-spec';
import { loadWindow } from '../../../server/services/windows/window-view';
import type { PlanReview } from '../../../shared/plans';
import { bookAssessed, closePlansApp, setupPlansNetwork, storeFinishedPlan, windowRow, type PlansContext } from './helpers';

// This file books in November 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
let ctx: PlansContext;
let id: (name: string) => string;

beforeAll(async () => ({ ctx, id } = await setupPlansNetwork(NOW)));
afterAll(() => closePlansApp(ctx));

/**
 * During the overlap each slice sits where the first plan naming it puts it (null: out of service), else where
 * it is today. Returns every element of this file's network loaded beyond its capacity with both windows' elements
 * out, and every use of an element either window takes down.
 */
function doubleBookings(inv: Inventory, reviews: PlanReview[], windows: WindowSpec[], prefix: string): string[] {
  const both: WindowSpec = {
    id: 'both', downSites: windows.flatMap((w) => w.downSites), downSpans: windows.flatMap((w) => w.downSpans),
    reduced: windows.flatMap((w) => w.reduced),
  };
  const cap = windowCapacity(inv, both);
  const during = new Map<number, SlicePlacement | null>();
  for (const review of reviews) {
    for (const [s, p] of fromSlicePlans(inv, review.slices.map(toSlicePlan))) if (!during.has(s)) during.set(s, p);
  }
  const load = placementLoad(inv, inv.slices.map((s) => s.index).filter((s) => !during.has(s)));
  for (const [s, p] of during) if (p) addPlacementLoad(inv, s, p, load);
  const problems: string[] = [];
  inv.network.spans.forEach((span, i) => {
    if (!span.id.startsWith(prefix) || load.spanGbps[i] === 0) return;
    if (cap.spanDown[i]) problems.push(`${span.id} is down but carries ${load.spanGbps[i]}`);
    else if (!fits(load.spanGbps[i], cap.spanGbps[i])) problems.push(`${span.id} carries ${load.spanGbps[i]} of ${cap.spanGbps[i]}`);
  });
  inv.network.sites.forEach((site, i) => {
    if (site.id.startsWith(prefix) && load.siteCpu[i] > 0 && !fits(load.siteCpu[i], cap.siteCpu[i])) problems.push(`${site.id} over its vCPU`);
  });
  return problems;
}

test('the second of two overlapping windows is planned around the first one\'s accepted plan, and both together fit', async () => {
  const w1 = await bookAssessed(ctx, 'first', '2027-11-02T22:00:00Z', '2027-11-03T02:00:00Z', [{ kind: 'span', id: id('p1'), effect: 'down' }]);
  const w2 = await bookAssessed(ctx, 'second', '2027-11-02T23:00:00Z', '2027-11-03T03:00:00Z', [{ kind: 'span', id: id('p2'), effect: 'down' }]);
  const planner = await ctx.as('planner');

  // Window 1 alone: S1 reroutes over the thin backup span bk (1 of its 1.5 Gbit/s).
  const first = await storeFinishedPlan(ctx, w1);
  expect(first.review.reservedFor).toEqual([]);
  expect(first.review.slices.find((s) => s.slice === id('S1'))?.after?.paths[id('e1')]).toContain(id('bk'));
  expect((await planner('post', `/api/plans/${first.planId}/accept`).send({})).status).toBe(200);

  // A run for window 2 that ignored window 1 would put S2 on bk as well (2 Gbit/s on 1.5): accepting it is refused.
  const blind = await storeFinishedPlan(ctx, w2, { reserve: false });
  expect(blind.review.slices.find((s) => s.slice === id('S2'))?.after?.paths[id('e2')]).toContain(id('bk'));
  const refused = await planner('post', `/api/plans/${blind.planId}/accept`).send({});
  expect(refused.status).toBe(409);
  expect(refused.body.error.code).toBe('PLAN_NO_LONGER_FITS');
  expect(refused.body.error.message).toContain(w1);
  expect((await windowRow(ctx, w2)).status).toBe('assessed');

  // The real run holds window 1's share back; whatever it cannot place is an outage the planner accepts by name.
  const second = await storeFinishedPlan(ctx, w2, { settings: { mode: 'serial', timeLimitSeconds: 1, seed: 3 } });
  expect(second.review.reservedFor).toEqual([w1]);
  const unresolved = second.review.slices.filter((s) => s.outcome === 'unresolved').map((s) => s.slice);
  expect(unresolved).toContain(id('S2'));
  const accepted = await planner('post', `/api/plans/${second.planId}/accept`).send({ outageAccepted: unresolved });
  expect(accepted.status).toBe(200);
  expect(await windowRow(ctx, w2)).toMatchObject({ status: 'planned', accepted_plan_id: second.planId });

  // Independent check over both: window 2's plan verifies with window 1's reservations, and the load of both fits.
  const { inventory } = await loadInventory(ctx.db);
  const specs = [windowSpecOf(await loadWindow(ctx.db, w1, null)), windowSpecOf(await loadWindow(ctx.db, w2, null))];
  const held = await reservationsFor(ctx.db, w2, inventory);
  expect(held.reservedFor).toEqual([w1]);
  const verdict = verifyPlan(inventory, specs[1], { affected: second.review.affected, slices: second.review.slices.map(toSlicePlan) }, held.reservations);
  expect(verdict.violations).toEqual([]);
  expect(doubleBookings(inventory, [first.review, second.review], specs, ctx.prefix)).toEqual([]);
  // The check itself catches the refused plan's double booking.
  expect(doubleBookings(inventory, [first.review, blind.review], specs, ctx.prefix)).toEqual([expect.stringContaining(id('bk'))]);
});
