// Properties of the planning engine on random small scenarios (Waxman networks from the scenario builder).
// Each test name states the invariant. numRuns stay small: every run plans a window, some in worker threads.
import fc from 'fast-check';
import { exactPlan, exactSolver } from '../../planner/exact/exact-plan';
import { buildScenario } from '../../scenarios/generate/scenario-builder';
import { randomWindow } from '../../scenarios/generate/random-window';
import { buildInventory, compileWindow } from '../../planner/model/build-inventory';
import type { Inventory, Objective, PlanMode, PlanResult, WindowSpec } from '../../planner/model/types';
import { compareObjectives } from '../../planner/plan/evaluate-plan';
import { planWindow } from '../../planner/remap/plan-window';
import { buildRemapProblem } from '../../planner/remap/problem';
import { createRng } from '../../planner/random/rng';
import { verifyPlan } from '../../planner/verify/verify-plan';
import { createParallelRunner } from '../../planner/workers/parallel-runner';
import type { Scenario } from '../../shared/scenario';

jest.setTimeout(180_000);

const runner = createParallelRunner();
afterAll(() => runner.close());

/** DE kept small so a property run takes well under a second. */
const DE = { population: 12, generations: 25, stallGenerations: 15, timeLimitMs: 20_000, workers: 2 };

interface Case {
  scenario: Scenario;
  inv: Inventory;
  window: WindowSpec;
}

function makeCase({ seed, sites, slices }: { seed: number; sites: number; slices: number }): Case {
  const scenario = buildScenario({ sites, slices, seed, windows: 0 });
  const w = randomWindow(scenario, createRng(seed), 'w');
  scenario.windows = [w];
  return { scenario, inv: buildInventory(scenario), window: compileWindow(w) };
}

const caseArb = fc.record({ seed: fc.integer({ min: 1, max: 1_000_000 }), sites: fc.integer({ min: 5, max: 9 }), slices: fc.integer({ min: 3, max: 10 }) })
  .map(makeCase);

function plan(c: Case, mode: PlanMode, seed = 1): Promise<PlanResult> {
  return planWindow(c.inv, c.window, { ...DE, mode, seed, scenario: c.scenario, parallel: runner, exact: exactSolver });
}

/** Slices with a function on, or a path through, an element the window takes down or reduces. */
function touched(c: Case): Set<string> {
  const out = new Set<string>();
  const sites = new Set([...c.window.downSites, ...c.window.reduced.flatMap((r) => ('site' in r ? [r.site] : []))]);
  const spans = new Set([...c.window.downSpans, ...c.window.reduced.flatMap((r) => ('span' in r ? [r.span] : []))]);
  c.scenario.spans.forEach((s) => (sites.has(s.a) || sites.has(s.b)) && spans.add(s.id));
  for (const p of c.scenario.placements) {
    if (Object.values(p.sites).some((s) => sites.has(s)) || Object.values(p.paths).some((path) => path.some((s) => spans.has(s)))) out.add(p.slice);
  }
  return out;
}

const MODES: PlanMode[] = ['serial', 'greedy', 'islands', 'shared-eval', 'exact'];
const levels = (o: Objective): Objective => ({ ...o, peakUtilisation: 0 });

describe('planner properties', () => {
  it('every plan of every mode passes verifyPlan', async () => {
    await fc.assert(fc.asyncProperty(caseArb, async (c) => {
      for (const mode of MODES) {
        const r = await plan(c, mode);
        expect(verifyPlan(c.inv, c.window, r).violations).toEqual([]);
      }
    }), { numRuns: 3 });
  });

  // A slice that only crosses a reduced span may still fit, so it is touched without being affected; such a
  // slice may then be moved to make room like any other. The invariant is on `affected`, which must lie
  // within the touched set.
  it('slices the window does not affect appear only as knock-on moves naming affected slices, never without knock-on', async () => {
    await fc.assert(fc.asyncProperty(caseArb, fc.boolean(), async (c, knockOn) => {
      const mine = touched(c);
      const r = await planWindow(c.inv, c.window, { ...DE, mode: 'serial', knockOn });
      for (const id of r.affected) expect(mine.has(id)).toBe(true);
      const affected = new Set(r.affected);
      for (const s of r.slices) {
        if (affected.has(s.slice)) {
          expect(s.madeRoomFor).toBeUndefined();
          continue;
        }
        expect(knockOn).toBe(true);
        expect(['move', 'reroute']).toContain(s.outcome);
        expect(s.madeRoomFor!.length).toBeGreaterThan(0);
        for (const t of s.madeRoomFor!) expect(r.affected).toContain(t);
      }
      // Found by a CI run: slice 3 only crosses a span reduced to 77 % and is moved to make room.
    }), { numRuns: 8, examples: [[makeCase({ seed: 16, sites: 7, slices: 5 }), true]] });
  });

  it('no plan uses a down site, a down span or a span touching a down site', async () => {
    await fc.assert(fc.asyncProperty(caseArb, async (c) => {
      const downSites = new Set(c.window.downSites);
      const downSpans = new Set(c.window.downSpans);
      c.scenario.spans.forEach((s) => (downSites.has(s.a) || downSites.has(s.b)) && downSpans.add(s.id));
      for (const mode of ['serial', 'greedy'] as const) {
        const r = await plan(c, mode);
        for (const s of r.slices) {
          for (const site of Object.values(s.sites)) expect(downSites.has(site)).toBe(false);
          for (const path of Object.values(s.paths)) for (const span of path) expect(downSpans.has(span)).toBe(false);
        }
      }
    }), { numRuns: 8 });
  });

  it('the same seed gives the same plan (serial and islands)', async () => {
    await fc.assert(fc.asyncProperty(caseArb, fc.integer({ min: 0, max: 1000 }), async (c, seed) => {
      for (const mode of ['serial', 'islands'] as const) {
        const a = await plan(c, mode, seed);
        const b = await plan(c, mode, seed);
        expect(b.slices).toEqual(a.slices);
        expect(b.objective).toEqual(a.objective);
      }
    }), { numRuns: 3 });
  });

  it('a window touching nothing returns an empty plan', async () => {
    await fc.assert(fc.asyncProperty(caseArb, async (c) => {
      const used = new Set(c.scenario.placements.flatMap((p) => Object.values(p.paths).flat()));
      const idle = c.scenario.spans.find((s) => !used.has(s.id));
      const quiet: WindowSpec = { id: 'quiet', downSites: [], downSpans: idle ? [idle.id] : [], reduced: [] };
      const r = await planWindow(c.inv, quiet, { ...DE, mode: 'serial' });
      expect(r.affected).toEqual([]);
      expect(r.slices).toEqual([]);
    }), { numRuns: 8 });
  });

  it('the plan handed out is never worse than greedy (the search alone: de-alone-vs-greedy.test.ts)', async () => {
    await fc.assert(fc.asyncProperty(caseArb, async (c) => {
      const de = await plan(c, 'serial');
      const greedy = await plan(c, 'greedy');
      expect(compareObjectives(de.objective, greedy.objective)).toBeLessThanOrEqual(0);
    }), { numRuns: 8 });
  });

  it('on instances small enough for a proven optimum, exact ≤ DE in objective order', async () => {
    await fc.assert(fc.asyncProperty(caseArb, async (c) => {
      const problem = buildRemapProblem(c.inv, c.window, { maxCandidates: 16 });
      const ex = await exactPlan(problem, { timeLimitMs: 20_000 });
      fc.pre(ex.optimal && ex.complete);
      // touched slices only on both sides: the program re-places exactly the problem built above
      const de = await planWindow(c.inv, c.window, { ...DE, mode: 'serial', knockOn: false });
      // peak utilisation is a tie-break the program does not model; compare the three modelled levels
      // (a window touching nothing has no search: its empty plan is the objective)
      expect(compareObjectives(levels(ex.objective), levels(de.search?.objective ?? de.objective))).toBeLessThanOrEqual(0);
    }), { numRuns: 6 });
  });
});
