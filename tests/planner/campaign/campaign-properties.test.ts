// Properties of every schedule the campaign scheduler produces on random problems; each name states the invariant.
// The rule checks here are written afresh, not borrowed from the scheduler, so a shared mistake cannot hide.
import fc from 'fast-check';
import {
  campaignCost, campaignIssues, scheduleCampaign, UNSCHEDULED_PENALTY, type CampaignProblem, type CampaignSchedule,
} from '../../../planner/campaign/schedule-campaign';
import { problemArb, FULL_SIZES } from './campaign-arbitraries';
import { dayGap } from './campaign-fixtures';

const RUNS = { numRuns: 60, seed: 20_261_205 };
const seedArb = fc.integer({ min: 0, max: 2 ** 31 - 1 });

function scheduled(p: CampaignProblem, r: CampaignSchedule) {
  return r.assignment.flatMap((s, g) => (s === null ? [] : [{ g, slot: p.groups[g].slots[s] }]));
}

describe('campaign schedules on random problems', () => {
  it('campaignIssues finds nothing wrong with any produced schedule', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES, true), seedArb, (p, seed) => {
      expect(campaignIssues(p, scheduleCampaign(p, { seed, maxIterations: 4000 }).assignment)).toEqual([]);
    }), RUNS);
  });

  it('every slot index points into its own group\'s slots, and only unscheduled groups carry a reason', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES), seedArb, (p, seed) => {
      const r = scheduleCampaign(p, { seed, maxIterations: 4000 });
      expect(r.assignment).toHaveLength(p.groups.length);
      r.assignment.forEach((s, g) => {
        if (s !== null) expect(Number.isInteger(s) && s >= 0 && s < p.groups[g].slots.length).toBe(true);
        expect(r.unscheduledReasons[g] === null).toBe(s !== null);
      });
    }), RUNS);
  });

  it('no night holds more windows than maxPerNight', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES), seedArb, (p, seed) => {
      const perNight = new Map<string, number>();
      for (const { slot } of scheduled(p, scheduleCampaign(p, { seed, maxIterations: 4000 }))) {
        perNight.set(slot.night, (perNight.get(slot.night) ?? 0) + 1);
      }
      for (const count of perNight.values()) expect(count).toBeLessThanOrEqual(p.rules.maxPerNight);
    }), RUNS);
  });

  it('a slice is touched at most once in D days', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES), seedArb, (p, seed) => {
      const windows = scheduled(p, scheduleCampaign(p, { seed, maxIterations: 4000 }));
      const D = p.rules.minDaysBetweenTouches;
      for (const a of windows) {
        for (const b of windows) {
          if (a.g >= b.g || D === 0 || !p.groups[a.g].touched.some((t) => p.groups[b.g].touched.includes(t))) continue;
          expect(dayGap(a.slot.night, b.slot.night)).toBeGreaterThanOrEqual(D);
        }
      }
    }), RUNS);
  });

  it('clashing groups are never out at the same time', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES), seedArb, (p, seed) => {
      const r = scheduleCampaign(p, { seed, maxIterations: 4000 });
      for (const [i, j] of p.clashes) {
        const a = r.assignment[i];
        const b = r.assignment[j];
        if (a === null || b === null) continue;
        const [x, y] = [p.groups[i].slots[a], p.groups[j].slots[b]];
        expect(x.startMs < y.endMs && y.startMs < x.endMs).toBe(false);
      }
    }), RUNS);
  });

  it('totalCost is the recomputed sum, never above the constructive start\'s', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES, true), seedArb, (p, seed) => {
      const r = scheduleCampaign(p, { seed, maxIterations: 4000 });
      expect(r.totalCost).toBe(campaignCost(p, r.assignment));
      expect(r.windowsCost).toBeCloseTo(scheduled(p, r).reduce((sum, w) => sum + w.slot.cost, 0), 6);
      expect(r.totalCost).toBeLessThanOrEqual(r.startCost);
      expect(r.startCost).toBeCloseTo(r.startWindowsCost + UNSCHEDULED_PENALTY * r.startUnscheduled, 6);
      expect(r.assignment.filter((s) => s === null).length).toBeLessThanOrEqual(r.startUnscheduled);
      expect(r.iterations).toBeLessThanOrEqual(4000);
    }), RUNS);
  });

  it('the same seed gives the same schedule', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES), seedArb, (p, seed) => {
      expect(scheduleCampaign(p, { seed, maxIterations: 3000 })).toEqual(scheduleCampaign(p, { seed, maxIterations: 3000 }));
    }), { ...RUNS, numRuns: 25 });
  });

  it('a group left unscheduled has no slot it could take as the schedule stands', () => {
    fc.assert(fc.property(problemArb(FULL_SIZES), seedArb, (p, seed) => {
      const r = scheduleCampaign(p, { seed, maxIterations: 4000 });
      r.assignment.forEach((s, g) => {
        if (s !== null) return;
        p.groups[g].slots.forEach((_, k) => {
          expect(campaignIssues(p, r.assignment.map((x, h) => (h === g ? k : x))).length).toBeGreaterThan(0);
        });
      });
    }), RUNS);
  });
});
