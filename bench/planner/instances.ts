// Benchmark instances: Waxman networks (BRITE convention, α = 0.5, β = 0.2, see scenarios/generate/waxman.ts)
// loaded to 60–70 % peak utilisation, with random windows of 1–5 elements that touch at least one slice; and
// real-shape networks (preferential attachment, scarce capacity around one window of a site and two spans).
import { randomWindow } from '../../scenarios/generate/random-window';
import { buildRealShapeScenario } from '../../scenarios/generate/real-shape-scenario';
import { buildScenario } from '../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../planner/model/build-inventory';
import type { Inventory, WindowSpec } from '../../planner/model/types';
import { buildRemapProblem } from '../../planner/remap/problem';
import { createRng } from '../../planner/random/rng';
import type { Scenario } from '../../shared/scenario';

export interface Instance {
  label: string;
  scenario: Scenario;
  inv: Inventory;
  windows: WindowSpec[];
}

/** `count` windows whose re-mapping problem has between 1 and maxAffected affected slices. */
export function buildInstance(sites: number, slices: number, seed: number, count: number, maxAffected = Infinity, maxCandidates?: number): Instance {
  const scenario = buildScenario({ sites, slices, seed, windows: 0 });
  const inv = buildInventory(scenario);
  const rng = createRng(seed * 7919);
  const windows: WindowSpec[] = [];
  for (let tries = 0; windows.length < count && tries < 50 * count; tries += 1) {
    const w = compileWindow(randomWindow(scenario, rng, `w${tries}`));
    const n = buildRemapProblem(inv, w, { maxCandidates }).slices.length;
    if (n >= 1 && n <= maxAffected) windows.push(w);
  }
  return { label: `${sites} sites / ${slices} slices`, scenario, inv, windows };
}

export interface RealShapeInstance extends Instance {
  /** peak span utilisation with the window down and every touched slice on its shortest surviving path */
  peakUtilisation: number;
  /** the knock-on gate as "site/span (short x Gbit/s)", or null */
  gate: string | null;
}

/** One real-shape scenario and its one window (scenarios/generate/real-shape-scenario.ts). */
export function buildRealShapeInstance(sites: number, slices: number, seed: number): RealShapeInstance {
  const r = buildRealShapeScenario({ sites, slices, seed });
  return {
    label: `rs-${sites}x${slices}-s${seed}`, scenario: r.scenario, inv: buildInventory(r.scenario),
    windows: [compileWindow(r.window)], peakUtilisation: r.detourPeakUtilisation,
    gate: r.knockOnGate && `${r.knockOnGate.site}/${r.knockOnGate.span} (short ${r.knockOnGate.shortfallGbps} Gbit/s)`,
  };
}

export function log(message: string): void {
  process.stderr.write(`[bench] ${message}\n`);
}
