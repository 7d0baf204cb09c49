// Parallel DE modes in worker threads: shared evaluation follows the serial run exactly, islands are
// deterministic per seed, every plan verifies, and the pool leaves no thread behind.
import { compareObjectiveVectors } from '../../../planner/de/fitness';
import { InvalidOptionError } from '../../../planner/errors';
import type { Objective } from '../../../planner/model/types';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { compareObjectives } from '../../../planner/plan/evaluate-plan';
import { planWindow } from '../../../planner/remap/plan-window';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import { islandSizes } from '../../../planner/workers/islands';
import { createParallelRunner } from '../../../planner/workers/parallel-runner';

// Four searches in worker threads per test: on two shared cores under load a test can take over a minute. The
// bound is a safety net only; nothing here measures speed.
jest.setTimeout(240_000);

const scenario = buildScenario({ sites: 24, slices: 120, seed: 21 });
const inv = buildInventory(scenario);
// the window with the most affected slices, so the search has something to do
const window = compileWindow(scenario.windows![0]);
// Each test has its own pool, so a test that fails mid-run cannot leave the next one a busy runner.
let runner: ReturnType<typeof createParallelRunner>;
let de: { generations: number; stallGenerations: number; timeLimitMs: number; population: number; workers: number;
  scenario: typeof scenario; parallel: typeof runner };
beforeEach(() => {
  runner = createParallelRunner();
  // Runs end on their generation and evaluation budgets, never on the time limit (which would make the same seed
  // give different plans on a busy machine): the limit is far above any run's length.
  de = { generations: 12, stallGenerations: 1000, timeLimitMs: 600_000, population: 16, workers: 2, scenario, parallel: runner };
});
afterEach(() => runner.close());

describe('parallel runner', () => {
  it('shared-eval follows the serial run exactly for the same seed', async () => {
    const serial = await planWindow(inv, window, { ...de, mode: 'serial', seed: 3 });
    const shared = await planWindow(inv, window, { ...de, mode: 'shared-eval', seed: 3 });
    expect(shared.affected.length).toBeGreaterThan(0);
    expect(shared.slices).toEqual(serial.slices);
    expect(shared.trace.map((t) => t.best)).toEqual(serial.trace.map((t) => t.best));
  });

  it('islands give the same plan for the same seed, verify, and are never worse than greedy', async () => {
    const a = await planWindow(inv, window, { ...de, mode: 'islands', seed: 8, migrationInterval: 3 });
    const b = await planWindow(inv, window, { ...de, mode: 'islands', seed: 8, migrationInterval: 3 });
    const greedy = await planWindow(inv, window, { mode: 'greedy' });
    expect(b.slices).toEqual(a.slices);
    expect(b.trace).toEqual(a.trace);
    expect(verifyPlan(inv, window, a).ok).toBe(true);
    expect(compareObjectives(a.objective, greedy.objective)).toBeLessThanOrEqual(0);
  });

  it('the trace never gets worse from one generation to the next (in the search\'s own order)', async () => {
    const r = await planWindow(inv, window, { ...de, mode: 'islands', seed: 2, migrationInterval: 4 });
    // The search compares objectives exactly, level by level; compareObjectives treats sums within 1e-9 as equal
    // and may then rank a later point lower on peak utilisation, so the search's own order is the invariant here.
    const levels = (o: Objective) => [o.unresolvedWeight, o.moveCost, o.usage, o.peakUtilisation];
    for (let i = 1; i < r.trace.length; i += 1) expect(compareObjectiveVectors(levels(r.trace[i].best), levels(r.trace[i - 1].best))).toBeLessThanOrEqual(0);
  });

  it('splits the total population across islands of at least 4', () => {
    expect(islandSizes(40, 2)).toEqual([20, 20]);
    expect(islandSizes(41, 3)).toEqual([14, 14, 13]);
    expect(islandSizes(6, 2)).toEqual([6]);
  });

  it('rejects an unknown mode and a bad worker count', async () => {
    const input = { mode: 'bogus' as never, scenario, window, problemOptions: {}, deOptions: { population: 8, F: 0.5, CR: 0.2, generations: 1 }, seeds: [], seed: 1, workers: 2 };
    await expect(runner.run(input)).rejects.toBeInstanceOf(InvalidOptionError);
    await expect(runner.run({ ...input, mode: 'islands', workers: 0 })).rejects.toBeInstanceOf(InvalidOptionError);
  });

  it('close() ends every worker thread', async () => {
    const own = createParallelRunner();
    await planWindow(inv, window, { ...de, parallel: own, mode: 'shared-eval', generations: 1 });
    expect(own.liveWorkers()).toBe(2);
    await own.close();
    expect(own.liveWorkers()).toBe(0);
  });
});
