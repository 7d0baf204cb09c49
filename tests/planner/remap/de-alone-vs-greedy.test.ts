// DE judged alone — its own plan before any fallback to greedy's — on small random windows with scarce capacity
// (invented Waxman scenarios loaded to 85–95 % peak utilisation). The product keeps the better of the two plans;
// this property is about the search, so a regression that only the fallback hides makes it fail.
import fc from 'fast-check';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { randomWindow } from '../../../scenarios/generate/random-window';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { createRng } from '../../../planner/random/rng';
import { planWindow } from '../../../planner/remap/plan-window';

jest.setTimeout(300_000);

/** Small DE settings: a run takes a few tens of milliseconds on these sizes. */
const DE = { population: 12, generations: 15, stallGenerations: 8, timeLimitMs: 20_000 };

const tightCase = fc.record({
  seed: fc.integer({ min: 1, max: 1_000_000 }),
  sites: fc.integer({ min: 6, max: 10 }),
  slices: fc.integer({ min: 6, max: 18 }),
  knockOn: fc.boolean(),
}).map(({ seed, sites, slices, knockOn }) => {
  const scenario = buildScenario({ sites, slices, seed, windows: 0, band: { lo: 0.85, hi: 0.95 } });
  const w = randomWindow(scenario, createRng(seed), 'w');
  scenario.windows = [w];
  return { inv: buildInventory(scenario), window: compileWindow(w), knockOn };
});

describe('DE alone against greedy alone', () => {
  it('DE alone never leaves more unresolved weight than greedy alone (small tight windows)', async () => {
    let touchedSomething = 0;
    await fc.assert(fc.asyncProperty(tightCase, async (c) => {
      const greedy = await planWindow(c.inv, c.window, { mode: 'greedy', knockOn: c.knockOn });
      const de = await planWindow(c.inv, c.window, { ...DE, mode: 'serial', seed: 7, knockOn: c.knockOn });
      if (de.affected.length === 0) return;
      touchedSomething += 1;
      expect(de.search).toBeDefined();
      expect(de.search!.feasible).toBe(true);
      expect(de.search!.objective.unresolvedWeight).toBeLessThanOrEqual(greedy.objective.unresolvedWeight);
    }), { numRuns: 200, seed: 20261204 });
    // The generator must actually produce windows to re-plan, or the property says nothing.
    expect(touchedSomething).toBeGreaterThan(100);
  });
});
