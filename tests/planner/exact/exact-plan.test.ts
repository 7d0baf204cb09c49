// The exact solver (HiGHS integer program) against brute-force enumeration on tiny instances.
// Source: HiGHS as the reference MIP solver (REFERENCES.md, "Exact reference"); brute force is exact by construction.
import { exactPlan } from '../../../planner/exact/exact-plan';
import { exactWeights, weightedObjective } from '../../../planner/exact/exact-weights';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { evaluatePlan, toSlicePlans } from '../../../planner/plan/evaluate-plan';
import { buildRemapProblem } from '../../../planner/remap/problem';
import type { RemapProblem } from '../../../planner/remap/remap-types';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import { bruteForce, type BruteOptimum } from './brute-force';

jest.setTimeout(120_000);

/** Tiny instances (≤ 3 affected slices, 2–3 candidates per function) from the scenario builder. */
function tinyProblems(count: number): { p: RemapProblem; brute: BruteOptimum }[] {
  const out: { p: RemapProblem; brute: BruteOptimum }[] = [];
  for (let seed = 1; out.length < count && seed < 200; seed += 1) {
    const sc = buildScenario({ sites: 6, slices: 4, seed, windows: 1 });
    const inv = buildInventory(sc);
    const p = buildRemapProblem(inv, compileWindow(sc.windows![0]), { maxCandidates: 3 });
    const brute = p.slices.length >= 1 && p.slices.length <= 3 ? bruteForce(p) : null;
    if (brute) out.push({ p, brute });
  }
  return out;
}

const close = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(1, Math.abs(a), Math.abs(b));

describe('exactPlan', () => {
  const problems = tinyProblems(8);

  it('finds instances to check', () => {
    expect(problems.length).toBe(8);
  });

  it('matches the brute-force optimum (unresolved weight, move cost, usage) and proves it', async () => {
    let nonTrivial = 0;
    for (const { p, brute } of problems) {
      const ex = await exactPlan(p, { timeLimitMs: 20_000 });
      expect(ex.optimal).toBe(true);
      expect(ex.complete).toBe(true);
      expect(ex.gap).toBe(0);
      expect(ex.objective.unresolvedWeight).toBe(brute.key[0]);
      expect(close(ex.objective.moveCost, brute.key[1])).toBe(true);
      expect(close(ex.objective.usage, brute.key[2])).toBe(true);
      if (brute.key[1] > 0) nonTrivial += 1;
    }
    // the instances must make the solver move or reroute something, or the check proves little
    expect(nonTrivial).toBeGreaterThanOrEqual(3);
  });

  it('returns plans that pass verifyPlan, with bound equal to the weighted optimum', async () => {
    for (const { p } of problems) {
      const ex = await exactPlan(p, { timeLimitMs: 20_000 });
      const affected = p.affected.map((s) => p.inv.slices[s].id);
      expect(verifyPlan(p.inv, p.window, { affected, slices: toSlicePlans(p.inv, ex.next) }).violations).toEqual([]);
      expect(ex.bound).toBeCloseTo(ex.weighted, 6);
      expect(evaluatePlan(p.inv, p.window, ex.next)).toEqual(ex.objective);
    }
  });

  it('weights order the levels lexicographically: one unresolved step outweighs any move cost', () => {
    const { p } = problems[0];
    const w = exactWeights(p);
    const maxMove = p.slices.reduce((s, b) => s + p.inv.slices[b.slice].functions.reduce((a, f) => a + f.moveCost, 0)
      + 0.25 * p.inv.slices[b.slice].ties.length, 0);
    const base = { unresolvedWeight: 0, moveCost: 0, usage: 0 };
    expect(weightedObjective(w, { ...base, unresolvedWeight: 1 })).toBeGreaterThan(weightedObjective(w, { ...base, moveCost: maxMove, usage: 0 }));
    expect(weightedObjective(w, { ...base, moveCost: w.moveStep })).toBeGreaterThan(weightedObjective(w, { ...base, usage: 1 / w.usage - 1 }));
  });

  it('an empty window gives an empty, optimal plan', async () => {
    const sc = buildScenario({ sites: 6, slices: 4, seed: 1, windows: 1 });
    const inv = buildInventory(sc);
    const p = buildRemapProblem(inv, { id: 'none', downSites: [], downSpans: [], reduced: [] });
    const ex = await exactPlan(p);
    expect(ex.next.size).toBe(0);
    expect(ex.optimal).toBe(true);
  });
});
