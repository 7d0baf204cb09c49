// Scores a move plan with the lexicographic objective of DESIGN §4.2 (unresolved weight, move cost, usage, peak).
import type { Inventory, Objective, Reservation, SlicePlacement, WindowSpec } from '../model/types';
import { addPlacementLoad, placementLoad, windowCapacity } from '../model/window-capacity';
import { changedTies, classifyOutcome } from './slice-plans';

export { classifyOutcome, changedTies, toSlicePlans, fromSlicePlans } from './slice-plans';

/**
 * Cost of changing one tie's path, against moveCost (default 1) of moving a function:
 * a reroute is a control-plane change without state transfer, so it is a fraction of a move (common-practice choice).
 */
export const REROUTE_COST = 0.25;

/** Priority 1 weighs 5, priority 5 weighs 1. */
export function sliceWeight(priority: number): number {
  return 6 - priority;
}

/** Float sums reached in different orders must not decide a comparison. */
const RELATIVE_TOLERANCE = 1e-9;

function compareWithTolerance(a: number, b: number): number {
  const scale = Math.max(Math.abs(a), Math.abs(b), 1);
  return Math.abs(a - b) > RELATIVE_TOLERANCE * scale ? compareNumber(a, b) : 0;
}

function peakUtilisation(
  inv: Inventory, window: WindowSpec, next: Map<number, SlicePlacement | null>, reservations?: Reservation,
): number {
  const cap = windowCapacity(inv, window);
  const untouched = inv.slices.map((s) => s.index).filter((s) => !next.has(s));
  const load = placementLoad(inv, untouched);
  for (const [s, placement] of next) if (placement) addPlacementLoad(inv, s, placement, load);
  for (const [id, gbps] of Object.entries(reservations?.spanGbps ?? {})) {
    const i = inv.network.spanIndex.get(id);
    if (i !== undefined) load.spanGbps[i] += gbps;
  }
  let peak = 0;
  for (let i = 0; i < cap.spanGbps.length; i++) {
    // Down spans carry nothing in a valid plan; verifyPlan reports any use of them.
    if (cap.spanDown[i]) continue;
    peak = Math.max(peak, load.spanGbps[i] / cap.spanGbps[i]);
  }
  return peak;
}

export function evaluatePlan(
  inv: Inventory, window: WindowSpec, next: Map<number, SlicePlacement | null>, reservations?: Reservation,
): Objective {
  const o: Objective = { unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 0, moveCost: 0, usage: 0, peakUtilisation: 0 };
  const latency = inv.network.spans.map((s) => s.latencyMs);
  for (const [s, placement] of next) {
    const slice = inv.slices[s];
    const outcome = classifyOutcome(inv, s, placement);
    if (placement === null) {
      o.unresolved++;
      o.unresolvedWeight += sliceWeight(slice.priority);
      continue;
    }
    if (outcome === 'move') o.moved++;
    if (outcome === 'reroute') o.rerouted++;
    const current = inv.placements[s];
    slice.functions.forEach((f, i) => { if (placement.sites[i] !== current.sites[i]) o.moveCost += f.moveCost; });
    o.moveCost += REROUTE_COST * changedTies(inv, s, placement);
    slice.ties.forEach((t, i) => {
      let pathMs = 0;
      for (const span of placement.paths[i]) pathMs += latency[span];
      o.usage += t.bandwidthGbps * pathMs;
    });
  }
  o.peakUtilisation = peakUtilisation(inv, window, next, reservations);
  return o;
}

function compareNumber(a: number, b: number): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Negative when `a` is better. Lexicographic: unresolvedWeight, moveCost, usage (1e-9 relative), peakUtilisation. */
export function compareObjectives(a: Objective, b: Objective): number {
  const byWeight = compareNumber(a.unresolvedWeight, b.unresolvedWeight);
  if (byWeight !== 0) return byWeight;
  const byCost = compareWithTolerance(a.moveCost, b.moveCost);
  if (byCost !== 0) return byCost;
  const byUsage = compareWithTolerance(a.usage, b.usage);
  if (byUsage !== 0) return byUsage;
  return compareNumber(a.peakUtilisation, b.peakUtilisation);
}
