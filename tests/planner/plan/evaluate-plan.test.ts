import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import {
  REROUTE_COST, classifyOutcome, compareObjectives, evaluatePlan, fromSlicePlans, sliceWeight, toSlicePlans,
} from '../../../planner/plan/evaluate-plan';
import type { Objective, SlicePlacement, SlicePlan } from '../../../planner/model/types';
import { UnknownElementError } from '../../../planner/errors';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

const inv = buildInventory(tinyScenario());
const siteB = compileWindow(window('w-site-b', { sites: ['B'] }));
const plans: SlicePlan[] = [
  { slice: 's-hosted', outcome: 'move', sites: { gw: 'C', app: 'A' }, paths: { 'gw-app': ['ac'] } },
  { slice: 's-transit', outcome: 'reroute', sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'cd', 'ac'] } },
];
const span = (id: string) => inv.network.spans[inv.network.spanIndex.get(id)!];

describe('evaluatePlan', () => {
  it('counts outcomes, move cost, usage and peak utilisation of a hand-checked plan', () => {
    const o = evaluatePlan(inv, siteB, fromSlicePlans(inv, plans));
    expect(o).toMatchObject({ unresolved: 0, unresolvedWeight: 0, moved: 1, rerouted: 1 });
    // gw moveCost 2 (fixture) + one changed tie in each slice
    expect(o.moveCost).toBeCloseTo(2 + 2 * REROUTE_COST, 12);
    const transitMs = span('de').latencyMs + span('cd').latencyMs + span('ac').latencyMs;
    expect(o.usage).toBeCloseTo(2 * span('ac').latencyMs + 5 * transitMs, 12);
    // de carries the 5 Gbit/s transit tie on 10 Gbit/s; cd carries 5 + 1 (s-quiet) of 20
    expect(o.peakUtilisation).toBeCloseTo(0.5, 12);
  });

  it('weighs unresolved slices by priority and gives them no load', () => {
    const next = new Map<number, SlicePlacement | null>([[inv.sliceIndex.get('s-transit')!, null]]);
    const o = evaluatePlan(inv, siteB, next);
    expect(o.unresolved).toBe(1);
    expect(o.unresolvedWeight).toBe(sliceWeight(1));
    expect(o.usage).toBe(0);
    expect(classifyOutcome(inv, 0, null)).toBe('unresolved');
  });

  it('orders objectives lexicographically with a tolerance on usage', () => {
    const base: Objective = { unresolvedWeight: 1, unresolved: 1, moved: 0, rerouted: 0, moveCost: 5, usage: 10, peakUtilisation: 0.5 };
    expect(compareObjectives({ ...base, unresolvedWeight: 0, moveCost: 99 }, base)).toBeLessThan(0);
    expect(compareObjectives({ ...base, moveCost: 4, usage: 99 }, base)).toBeLessThan(0);
    expect(compareObjectives({ ...base, usage: 9 }, base)).toBeLessThan(0);
    expect(compareObjectives({ ...base, usage: 10 * (1 + 1e-12), peakUtilisation: 0.4 }, base)).toBeLessThan(0);
    expect(compareObjectives(base, { ...base })).toBe(0);
  });
});

describe('toSlicePlans / fromSlicePlans', () => {
  it('round-trips and classifies outcomes', () => {
    const next = fromSlicePlans(inv, plans);
    expect(toSlicePlans(inv, next)).toEqual(plans);
    const stay = new Map([[0, inv.placements[0]]]);
    expect(toSlicePlans(inv, stay)[0].outcome).toBe('stays');
  });

  it('throws UnknownElementError on unknown ids', () => {
    expect(() => fromSlicePlans(inv, [{ ...plans[0], sites: { gw: 'Q', app: 'A' } }])).toThrow(UnknownElementError);
  });
});
