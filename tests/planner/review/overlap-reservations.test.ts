// overlapReservations: what an accepted plan of an overlapping window reserves, and — as a property — that two
// overlapping windows planned one after the other never claim more than the network has during the overlap.
import fc from 'fast-check';
import { randomWindow } from '../../../scenarios/generate/random-window';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { fits } from '../../../planner/model/tolerance';
import type { Inventory, SlicePlacement, SlicePlan, WindowSpec } from '../../../planner/model/types';
import { addPlacementLoad, windowCapacity } from '../../../planner/model/window-capacity';
import { overlapReservations } from '../../../planner/plan/overlap-reservations';
import { fromSlicePlans } from '../../../planner/plan/slice-plans';
import { planWindow } from '../../../planner/remap/plan-window';
import { createRng } from '../../../planner/random/rng';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

jest.setTimeout(120_000);

const inv = buildInventory(tinyScenario());
const siteB = compileWindow(window('w-site-b', { sites: ['B'] }));
const reduceBd = compileWindow(window('w-reduce-bd', {}, [{ span: 'bd', fraction: 0.2 }]));

/** s-hosted: gw B → C (app stays on A), tie over ac; s-transit: rerouted de-cd-ac (de shared with the old path). */
const planSiteB: SlicePlan[] = [
  { slice: 's-hosted', outcome: 'move', sites: { gw: 'C', app: 'A' }, paths: { 'gw-app': ['ac'] } },
  { slice: 's-transit', outcome: 'reroute', sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'cd', 'ac'] } },
];

describe('overlapReservations (examples on the tiny network)', () => {
  it('reserves what the plan adds on top of today, and all of the down site with its spans', () => {
    const r = overlapReservations(inv, [{ window: siteB, slices: planSiteB }]);
    // B down: its 50 vCPU and both spans touching it (ab 40, bd 20) in full.
    // Additions: gw's 4 vCPU on C; gw-app's 2 Gbit/s and ran-upf's 5 on ac; ran-upf's 5 on cd; de is on both paths.
    expect(r.siteCpu).toEqual({ B: 50, C: 4 });
    expect(r.spanGbps).toEqual({ ab: 40, ac: 7, bd: 20, cd: 5 });
  });

  it('reserves nothing for slices that stay or stay unresolved, and skips ids the inventory no longer has', () => {
    const quiet = compileWindow(window('w-quiet', {}));
    const r = overlapReservations(inv, [{
      window: { ...quiet, downSites: ['gone-site'], downSpans: ['gone-span'] },
      slices: [
        { slice: 's-quiet', outcome: 'stays', sites: { c1: 'C', d1: 'D' }, paths: { 'c-d': ['cd'] } },
        { slice: 's-hosted', outcome: 'unresolved', sites: {}, paths: {}, reason: 'no room' },
        { slice: 'gone-slice', outcome: 'move', sites: { x: 'A' }, paths: {} },
        { slice: 's-transit', outcome: 'reroute', sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'gone-span'] } },
      ],
    }]);
    expect(r).toEqual({ siteCpu: {}, spanGbps: {} });
  });

  it('reserves the lost share of a reduced span, once per element across windows (the larger share wins)', () => {
    const alone = overlapReservations(inv, [{ window: reduceBd, slices: [] }]);
    expect(alone.spanGbps?.bd).toBeCloseTo(20 * 0.8, 12);
    const both = overlapReservations(inv, [{ window: reduceBd, slices: [] }, { window: siteB, slices: planSiteB }]);
    expect(both.spanGbps?.bd).toBe(20);
    // Additions of different plans add up.
    const twice = overlapReservations(inv, [{ window: siteB, slices: planSiteB }, { window: siteB, slices: planSiteB }]);
    expect(twice.siteCpu).toEqual({ B: 50, C: 8 });
    expect(twice.spanGbps?.ac).toBe(14);
  });

  it('makes the reserved elements unusable for a later run', async () => {
    const r = overlapReservations(inv, [{ window: siteB, slices: planSiteB }]);
    const later = compileWindow(window('w-span-ab', { spans: ['ab'] }));
    const result = await planWindow(inv, later, { mode: 'greedy', reservations: r });
    for (const s of result.slices) {
      expect(Object.values(s.sites)).not.toContain('B');
      for (const path of Object.values(s.paths)) expect(path).not.toEqual(expect.arrayContaining(['bd']));
    }
  });
});

/** Both windows at once: down in either, reduced to the smaller fraction. */
function union(a: WindowSpec, b: WindowSpec): WindowSpec {
  return {
    id: 'overlap', downSites: [...a.downSites, ...b.downSites], downSpans: [...a.downSpans, ...b.downSpans],
    reduced: [...a.reduced, ...b.reduced], durationHours: 1,
  };
}

/** Where every slice is during the overlap (later plan first, then the earlier one, else today) — and what breaks. */
function overlapProblems(net: Inventory, a: WindowSpec, b: WindowSpec, plans: Map<number, SlicePlacement | null>[]): string[] {
  const cap = windowCapacity(net, union(a, b));
  const load = { siteCpu: new Float64Array(cap.siteCpu.length), spanGbps: new Float64Array(cap.spanGbps.length) };
  const problems: string[] = [];
  for (const slice of net.slices) {
    const plan = plans.find((p) => p.has(slice.index));
    const placement = plan ? plan.get(slice.index)! : net.placements[slice.index];
    if (placement === null) continue;
    if (placement.sites.some((s) => cap.siteDown[s]) || placement.paths.some((p) => p.some((x) => cap.spanDown[x]))) {
      problems.push(`${slice.id} uses an element that is down during the overlap`);
    }
    addPlacementLoad(net, slice.index, placement, load);
  }
  load.siteCpu.forEach((l, i) => { if (!cap.siteDown[i] && !fits(l, cap.siteCpu[i])) problems.push(`site ${i}: ${l} > ${cap.siteCpu[i]}`); });
  load.spanGbps.forEach((l, i) => { if (!cap.spanDown[i] && !fits(l, cap.spanGbps[i])) problems.push(`span ${i}: ${l} > ${cap.spanGbps[i]}`); });
  return problems;
}

describe('overlapReservations (property)', () => {
  it('two overlapping windows planned one after the other never double-claim: the later plan verifies and both fit together', async () => {
    const arb = fc.record({ seed: fc.integer({ min: 1, max: 1_000_000 }), sites: fc.integer({ min: 6, max: 12 }), slices: fc.integer({ min: 4, max: 16 }) });
    await fc.assert(fc.asyncProperty(arb, async ({ seed, sites, slices }) => {
      const scenario = buildScenario({ sites, slices, seed, windows: 0 });
      const rng = createRng(seed);
      const w1 = compileWindow(randomWindow(scenario, rng, 'w1', { reducedShare: 0.3 }));
      const w2 = compileWindow(randomWindow(scenario, rng, 'w2', { reducedShare: 0.3 }));
      const net = buildInventory(scenario);
      const first = await planWindow(net, w1, { mode: 'greedy' });
      const reservations = overlapReservations(net, [{ window: w1, slices: first.slices }]);
      const second = await planWindow(net, w2, { mode: 'serial', seed, population: 10, generations: 15, timeLimitMs: 5_000, reservations });
      expect(verifyPlan(net, w2, { affected: second.affected, slices: second.slices }, reservations).violations).toEqual([]);
      expect(overlapProblems(net, w1, w2, [fromSlicePlans(net, second.slices), fromSlicePlans(net, first.slices)])).toEqual([]);
    }), { numRuns: 20, seed: 4242 });
  });
});
