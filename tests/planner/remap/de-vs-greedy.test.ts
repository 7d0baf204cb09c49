// Serial DE against the greedy reference on generated scenarios (invented data), and the parallel hook.
import { runDE } from '../../../planner/de/differential-evolution';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { compareObjectives } from '../../../planner/plan/evaluate-plan';
import { createRng } from '../../../planner/random/rng';
import { toDEProblem } from '../../../planner/remap/decoder';
import type { ParallelRunner, ParallelRunInput } from '../../../planner/remap/parallel-runner';
import { planWindow } from '../../../planner/remap/plan-window';
import { buildRemapProblem } from '../../../planner/remap/problem';
import { verifyPlan } from '../../../planner/verify/verify-plan';

const sc = buildScenario({ sites: 30, slices: 150, seed: 7 });
const inv = buildInventory(sc);
const windows = sc.windows!.slice(0, 3).map(compileWindow);
const opts = { population: 16, generations: 25 };

describe('serial DE vs greedy', () => {
  it.each(windows.map((w) => [w.id, w] as const))('%s: DE is never worse than greedy and both verify', async (_id, w) => {
    const greedy = await planWindow(inv, w, { mode: 'greedy' });
    const de = await planWindow(inv, w, { ...opts, mode: 'serial', seed: 3 });
    expect(compareObjectives(de.objective, greedy.objective)).toBeLessThanOrEqual(0);
    if (de.affected.length > 0) expect(de.search!.objective.unresolvedWeight).toBeLessThanOrEqual(greedy.objective.unresolvedWeight);
    for (const r of [greedy, de]) expect(verifyPlan(inv, w, { affected: r.affected, slices: r.slices }).violations).toEqual([]);
  });

  it('gives the same plan for the same seed (when the search ends on its budgets, not on the clock)', async () => {
    // A generous time limit: on a shared CI core the local search's time shares could otherwise cut a run short.
    const a = await planWindow(inv, windows[0], { ...opts, seed: 11, timeLimitMs: 600_000 });
    const b = await planWindow(inv, windows[0], { ...opts, seed: 11, timeLimitMs: 600_000 });
    expect(b.slices).toEqual(a.slices);
    expect(b.objective).toEqual(a.objective);
  });
});

describe('parallel modes delegate to the injected runner', () => {
  it('passes serializable input and decodes the returned genes on the calling thread', async () => {
    let seen: ParallelRunInput | undefined;
    // An in-thread stand-in: rebuilds the problem from the input as a worker would, then runs serial DE.
    const runner: ParallelRunner = {
      async run(input) {
        seen = input;
        const rebuilt = buildInventory(input.scenario);
        const problem = buildRemapProblem(rebuilt, input.window, input.problemOptions);
        return runDE(toDEProblem(problem), input.deOptions, createRng(input.seed), input.seeds);
      },
    };
    const r = await planWindow(inv, windows[0], { ...opts, mode: 'islands', parallel: runner, scenario: sc, workers: 3 });
    expect(seen!.mode).toBe('islands');
    expect(seen!.workers).toBe(3);
    expect(seen!.seeds.length).toBeGreaterThanOrEqual(2);
    expect(() => structuredClone({ ...seen!, onGeneration: undefined })).not.toThrow();
    expect(r.mode).toBe('islands');
    expect(verifyPlan(inv, windows[0], { affected: r.affected, slices: r.slices }).ok).toBe(true);
  });
});
