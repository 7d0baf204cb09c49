// (e) the real-shape set: preferential-attachment networks of 40–200 sites with 100–300 slices, capacity made
// scarce around one window of a site and two spans (scenarios/generate/real-shape-scenario.ts). DE alone
// (touched only, and with knock-on moves) against greedy and exact (touched only, and with knock-on blocks);
// then islands vs serial on the windows where serial DE works longest to reach its final objective.
import { EXACT_DEFAULTS } from '../../planner/exact/exact-plan';
import { buildRealShapeInstance, log, type RealShapeInstance } from './instances';
import { islandsVsSerial } from './islands-race';
import type { Row } from './report';
import { runShapeWindow, type ExactSetting, type ShapeOutcome } from './real-shape-run';
import { instanceRows, targetRows } from './real-shape-rows';

/** [sites, slices, seed]: sizes spread over the 40–200 site, 100–300 slice range. */
const FULL: [number, number, number][] = [
  [40, 100, 1], [40, 150, 2], [60, 120, 3], [80, 150, 4], [100, 200, 5],
  [120, 200, 6], [150, 250, 7], [160, 300, 8], [200, 250, 9], [200, 300, 10],
];
const QUICK: [number, number, number][] = [[40, 100, 1], [100, 200, 5], [200, 300, 10]];

/**
 * Exact with the planner's path setting (k = 4 shortest paths per tie; these networks are too big to list
 * every path). 60 s gives most of these windows a proven optimum; --quick takes 20 s and keeps a bound.
 */
function exactSetting(quick: boolean): ExactSetting {
  return { ...EXACT_DEFAULTS, timeLimitMs: quick ? 20_000 : 60_000 };
}

export async function realShape(quick: boolean): Promise<Row[]> {
  const sizes = quick ? QUICK : FULL;
  const instances: RealShapeInstance[] = sizes.map(([sites, slices, seed]) => buildRealShapeInstance(sites, slices, seed));
  const outcomes: ShapeOutcome[] = [];
  for (const inst of instances) {
    log(`(e) ${inst.label}: peak ${(100 * inst.peakUtilisation).toFixed(0)} % with the window down`);
    outcomes.push(await runShapeWindow(inst, exactSetting(quick)));
  }
  const race = await islandsVsSerial(instances.map((inst, i) => ({ inst, outcome: outcomes[i] })), quick ? 1 : 3);
  return [...instanceRows(outcomes), ...targetRows(outcomes), ...race];
}
