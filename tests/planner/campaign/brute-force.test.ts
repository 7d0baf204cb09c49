// On tiny campaigns (at most 4 groups of at most 4 slots) every assignment can be enumerated: the local search must
// reach the proven optimum, and the enumeration itself must agree with the rule checker.
import fc from 'fast-check';
import { bruteForceCampaign } from '../../../planner/campaign/brute-force';
import { campaignCost, campaignIssues, scheduleCampaign } from '../../../planner/campaign/schedule-campaign';
import { problemArb, TINY_SIZES } from './campaign-arbitraries';

/** Every assignment (null or a slot index per group), legal or not. */
function allAssignments(sizes: number[]): (number | null)[][] {
  return sizes.reduce<(number | null)[][]>((acc, n) => acc.flatMap((a) => [null, ...Array.from({ length: n }, (_, s) => s)].map((s) => [...a, s])), [[]]);
}

describe('the local search against exhaustive enumeration on tiny campaigns', () => {
  it('finds the proven optimum', () => {
    fc.assert(fc.property(problemArb(TINY_SIZES), fc.integer({ min: 0, max: 1000 }), (p, seed) => {
      expect(scheduleCampaign(p, { seed }).totalCost).toBe(bruteForceCampaign(p).cost);
    }), { numRuns: 300, seed: 4_202_612 });
  });

  it('the pruned enumeration agrees with checking every assignment by campaignIssues', () => {
    fc.assert(fc.property(problemArb(TINY_SIZES), (p) => {
      const legalCosts = allAssignments(p.groups.map((g) => g.slots.length))
        .filter((a) => campaignIssues(p, a).length === 0)
        .map((a) => campaignCost(p, a));
      const exact = bruteForceCampaign(p);
      expect(exact.cost).toBe(Math.min(...legalCosts));
      expect(campaignIssues(p, exact.assignment)).toEqual([]);
    }), { numRuns: 150, seed: 1_612_024 });
  });
});
