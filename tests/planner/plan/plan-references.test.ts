// The greedy reference a DE run carries (PlanResult.greedy) is the greedy-mode run's result on the same problem,
// so the references need not solve the window again after the search's time limit.
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { greedyFromSearch, greedyReference } from '../../../planner/plan/plan-references';
import { planWindow } from '../../../planner/remap/plan-window';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';

describe('greedy reference from the search', () => {
  it.each([false, true])('equals a greedy-mode run of the same window (knock-on %s)', async (knockOn) => {
    const sc = buildScenario({ sites: 20, slices: 80, seed: 11, windows: 4 });
    const inv = buildInventory(sc);
    let checked = 0;
    for (const w of sc.windows ?? []) {
      const window = compileWindow(w);
      const options = { seed: 3, timeLimitMs: 2_000, generations: 5, knockOn };
      const run = await planWindow(inv, window, { ...options, mode: 'serial' });
      if (run.affected.length === 0) continue;
      const fromSearch = greedyFromSearch(run);
      const alone = await greedyReference(inv, window, options);
      expect(fromSearch).not.toBeNull();
      expect(fromSearch!.objective).toEqual(alone.objective);
      expect(fromSearch!.elapsedMs).toBeGreaterThanOrEqual(0);
      checked += 1;
    }
    expect(checked).toBeGreaterThan(0);
  });

  it('is absent for a run that is not a DE search', async () => {
    const sc = buildScenario({ sites: 20, slices: 80, seed: 11, windows: 1 });
    const run = await planWindow(buildInventory(sc), compileWindow(sc.windows![0]), { mode: 'greedy' });
    expect(greedyFromSearch(run)).toBeNull();
  });
});
