// Mutation properties: a valid plan for a small random instance (built by hand-plan.ts, knock-on entries included)
// verifies clean, and one corruption of it is reported under the code that names it. 500 seeded cases each.
import fc from 'fast-check';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import {
  breakAnchor, breakPath, dropFunction, overloadSite, overloadSpan, shrinkLatencyBudget, useDownElement,
} from './plan-corruptions';
import { plannedCase, type Case, type CaseParams } from './random-plan-case';

const RUNS = 500;

const params: fc.Arbitrary<CaseParams> = fc.record({
  seed: fc.integer({ min: 1, max: 2 ** 31 - 1 }),
  sites: fc.integer({ min: 5, max: 9 }),
  slices: fc.integer({ min: 3, max: 10 }),
  pick: fc.nat({ max: 10_000 }),
  share: fc.double({ min: 0.001, max: 0.999, noNaN: true }),
});

const codes = (c: Case) => verifyPlan(c.inv, c.window, c.plan, c.reservations).violations.map((v) => v.code);

const PROPERTIES: [string, string, (c: Case, p: CaseParams) => Case | null, number][] = [
  ['a plan with one site over capacity (reserved away, or a function moved onto a full site) is reported as cpu-capacity', 'cpu-capacity', overloadSite, 0x1001],
  ['a plan with one span over capacity is reported as bandwidth-capacity', 'bandwidth-capacity', overloadSpan, 0x1002],
  ['a plan with a span dropped from, or two spans swapped in, a multi-span path is reported as broken-path', 'broken-path', breakPath, 0x1003],
  ['a plan that uses a site or span the window takes down is reported as down-element', 'down-element', useDownElement, 0x1004],
  ['a plan missing the site of one function is reported as missing-function', 'missing-function', dropFunction, 0x1005],
  ['a plan whose function sits where its anchor does not allow is reported as anchor', 'anchor', breakAnchor, 0x1006],
  ['a plan with a tie whose budget is below its planned path latency is reported as latency', 'latency', shrinkLatencyBudget, 0x1007],
];

describe('verifyPlan names every corruption of a valid plan', () => {
  it.each(PROPERTIES)('%s', (_name, code, corrupt, seed) => {
    let corrupted = 0;
    fc.assert(fc.property(params, (p) => {
      const base = plannedCase(p);
      expect(codes(base)).toEqual([]);
      const bad = corrupt(base, p);
      fc.pre(bad !== null);
      expect(codes(bad!)).toContain(code);
      corrupted++;
    }), { numRuns: RUNS, seed });
    expect(corrupted).toBeGreaterThanOrEqual(RUNS);
  });
});
