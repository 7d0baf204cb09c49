// A hand-made knock-on plan on the tiny network plus a parallel span cd2 (the planner core is not needed):
// ab goes down; touched slice T (A–B on ab, 8 Gbit/s) takes ac–cd–bd; untouched K (C–D on cd) moves to cd2.
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { Inventory, PlanResult, SlicePlacement, SlicePlan } from '../../../planner/model/types';
import { scenarioWith, tinyNetwork, window } from '../fixtures/tiny-scenario';

/** kGbps: what K carries on cd (20 Gbit/s); from 13 up, T only fits on cd once K has left. */
export function knockOnInventory(kGbps: number): Inventory {
  const net = tinyNetwork();
  net.spans = [...net.spans, { id: 'cd2', a: 'C', b: 'D', capacityGbps: 20, lengthKm: 17, mtbfHours: 20_000, mttrHours: 8 }];
  return buildInventory(scenarioWith([
    { id: 'T', functions: { t1: ['A', 1], t2: ['B', 1] }, ties: [['t', 't1', 't2', 8, 5, ['ab']]] },
    { id: 'K', functions: { k1: ['C', 1], k2: ['D', 1] }, ties: [['k', 'k1', 'k2', kGbps, 5, ['cd']]] },
  ], net));
}

export const knockOnWindow = compileWindow(window('w-ab', { spans: ['ab'] }));

export function knockOnNext(inv: Inventory): Map<number, SlicePlacement | null> {
  const span = (id: string) => inv.network.spanIndex.get(id)!;
  const [t, k] = [inv.sliceIndex.get('T')!, inv.sliceIndex.get('K')!];
  return new Map([
    [t, { sites: inv.placements[t].sites, paths: [[span('ac'), span('cd'), span('bd')]] }],
    [k, { sites: inv.placements[k].sites, paths: [[span('cd2')]] }],
  ]);
}

export const KNOCK_ON_PLANS: SlicePlan[] = [
  { slice: 'T', outcome: 'reroute', sites: { t1: 'A', t2: 'B' }, paths: { t: ['ac', 'cd', 'bd'] } },
  { slice: 'K', outcome: 'reroute', sites: { k1: 'C', k2: 'D' }, paths: { k: ['cd2'] }, madeRoomFor: ['T'] },
];

/** The planner's result for that plan (figures invented but consistent: two reroutes at 1 each). */
export function knockOnResult(search?: PlanResult['search']): PlanResult {
  const objective = { unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 2, moveCost: 2, usage: 100, peakUtilisation: 0.75 };
  return {
    window: 'w-ab', mode: 'serial', seed: 1, elapsedMs: 5, affected: ['T'], slices: KNOCK_ON_PLANS, objective,
    trace: [{ generation: 0, evaluations: 10, feasible: true, best: objective }], ...(search ? { search } : {}),
  };
}
