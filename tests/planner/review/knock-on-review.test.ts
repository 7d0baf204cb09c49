// buildReview with a hand-made knock-on plan: the untouched slice K, rerouted to make room for T, shows up as a
// knock-on row (names, not ids), its step goes first and is marked, totals count it, and its risk is shown.
import { buildReview } from '../../../planner/review/build-review';
import { planReviewSchema, type ReferenceResult } from '../../../shared/plans';
import { knockOnInventory, knockOnResult, knockOnWindow } from '../steps/knock-on-fixture';

const greedyRef: ReferenceResult = { solver: 'greedy', objective: null, elapsedMs: 1, optimal: null, gap: null, bound: null, note: 'test' };
const names = new Map([['T', 'Tram signalling'], ['K', 'Kiosk video']]);

describe('buildReview with a knock-on move', () => {
  const inv = knockOnInventory(15);

  it('carries the knock-on row, its reason by name, its ordered step, the count and its risk', () => {
    const r = planReviewSchema.parse(buildReview(inv, knockOnWindow, knockOnResult(), { greedy: greedyRef, exact: null, computeMs: 5, names }));
    expect(r.affected).toEqual(['T']);
    const k = r.slices.find((s) => s.slice === 'K')!;
    expect(k).toMatchObject({ name: 'Kiosk video', outcome: 'reroute', reasons: [], madeRoomFor: [{ slice: 'T', name: 'Tram signalling' }] });
    expect(k.reroutes).toEqual([{ tie: 'k', from: ['cd'], to: ['cd2'] }]);
    expect(r.slices.find((s) => s.slice === 'T')!.madeRoomFor).toEqual([]);
    expect(r.steps.map((s) => [s.slice, s.knockOn, s.needsSpare])).toEqual([['K', true, false], ['T', false, false]]);
    expect(r.totals).toMatchObject({ rerouted: 2, knockOn: 1 });
    expect(r.risk.map((x) => x.slice).sort()).toEqual(['K', 'T']);
    expect(r.search).toBeNull();
  });

  it('copies what the search alone found, with the fallback it used', () => {
    const own = { unresolvedWeight: 5, unresolved: 1, moved: 2, rerouted: 0, moveCost: 6.5, usage: 120, peakUtilisation: 0.9 };
    const result = knockOnResult({ objective: own, feasible: true, usedFallback: 'greedy' });
    const r = planReviewSchema.parse(buildReview(inv, knockOnWindow, result, { greedy: greedyRef, exact: null, computeMs: 5, names }));
    expect(r.search).toEqual({ objective: own, feasible: true, usedFallback: 'greedy' });
  });
});
