// The decoder's kernel: places one slice on given candidate sites, routes its ties and books the resources.
import { fits } from '../model/tolerance';
import type { SlicePlacement } from '../model/types';
import { shortestLatencyPath, type PathOptions } from '../paths/shortest-path';
import { REROUTE_COST } from '../plan/evaluate-plan';
import type { RemapProblem, RemapSlice } from './remap-types';

/** Running totals of one decode; the residual arrays are working copies that bookings consume. */
export interface BookingState {
  cpu: Float64Array;
  gbps: Float64Array;
  pathOptions: PathOptions;
  violation: number;
  unresolvedWeight: number;
  unresolved: number;
  moved: number;
  rerouted: number;
  moveCost: number;
  usage: number;
  peakUtilisation: number;
}

export function createBookingState(problem: RemapProblem): BookingState {
  const cpu = Float64Array.from(problem.residualCpu);
  const gbps = Float64Array.from(problem.residualGbps);
  return {
    cpu, gbps, pathOptions: { spanDown: problem.spanDown, siteDown: problem.siteDown, residualGbps: gbps },
    violation: 0, unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 0, moveCost: 0, usage: 0,
    peakUtilisation: problem.basePeakUtilisation,
  };
}

/** Back to the problem's residuals and zero totals, without allocating. */
export function resetBookingState(problem: RemapProblem, state: BookingState): void {
  state.cpu.set(problem.residualCpu);
  state.gbps.set(problem.residualGbps);
  state.violation = 0;
  state.unresolvedWeight = 0;
  state.unresolved = 0;
  state.moved = 0;
  state.rerouted = 0;
  state.moveCost = 0;
  state.usage = 0;
  state.peakUtilisation = problem.basePeakUtilisation;
}

function samePath(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return false;
  return true;
}

/** The current path, when it survives the window, fits the residual and still meets the budgets. */
function keepCurrentPath(problem: RemapProblem, state: BookingState, path: number[], gbps: number, maxLatencyMs: number): number[] | null {
  let latencyMs = 0;
  for (const span of path) {
    if (problem.spanDown[span] || !fits(gbps, state.gbps[span])) return null;
    latencyMs += problem.inv.network.spans[span].latencyMs;
  }
  return latencyMs <= maxLatencyMs ? path : null;
}

function pathAvailability(problem: RemapProblem, path: number[]): number {
  let a = 1;
  for (const span of path) a *= problem.inv.network.spans[span].availability;
  return a;
}

function bookPath(problem: RemapProblem, state: BookingState, path: number[], gbps: number): void {
  const spans = problem.inv.network.spans;
  for (const span of path) {
    state.gbps[span] -= gbps;
    state.usage += gbps * spans[span].latencyMs;
    const cap = problem.capacityGbps[span];
    if (cap > 0) state.peakUtilisation = Math.max(state.peakUtilisation, (cap - state.gbps[span]) / cap);
  }
}

/** Routes one tie and books it; returns its path or null when no path fits (counted as violation 1). */
function routeTie(problem: RemapProblem, state: BookingState, block: RemapSlice, tie: number, sites: Int32Array): number[] | null {
  const s = block.slice;
  const t = problem.inv.slices[s].ties[tie];
  const current = problem.inv.placements[s];
  const from = sites[t.from];
  const to = sites[t.to];
  let path: number[] | null = null;
  if (from === current.sites[t.from] && to === current.sites[t.to]) {
    path = keepCurrentPath(problem, state, current.paths[tie], t.bandwidthGbps, t.maxLatencyMs);
  }
  if (path === null) {
    state.pathOptions.minGbps = t.bandwidthGbps;
    state.pathOptions.maxLatencyMs = t.maxLatencyMs;
    path = shortestLatencyPath(problem.inv.network, from, to, state.pathOptions)?.spans ?? null;
  }
  if (path === null) {
    state.violation += 1;
    return null;
  }
  if (t.minAvailability !== undefined) {
    const a = pathAvailability(problem, path);
    if (a < t.minAvailability) state.violation += Math.min(1, (t.minAvailability - a) / Math.max(1e-12, 1 - t.minAvailability));
  }
  bookPath(problem, state, path, t.bandwidthGbps);
  if (!samePath(path, current.paths[tie])) state.moveCost += REROUTE_COST;
  return path;
}

/**
 * Books slice `block` on `sites` (one site per function). Over-full sites are booked anyway and counted
 * as violation (share of the demand that does not fit), so Deb's rules can steer away from them.
 * Returns the placement when `record`, else null.
 */
export function placeSlice(problem: RemapProblem, state: BookingState, block: RemapSlice, sites: Int32Array, record: boolean): SlicePlacement | null {
  const slice = problem.inv.slices[block.slice];
  const current = problem.inv.placements[block.slice];
  let moved = false;
  for (let fn = 0; fn < slice.functions.length; fn += 1) {
    const f = slice.functions[fn];
    const site = sites[fn];
    const free = Math.max(0, state.cpu[site]);
    if (!fits(f.cpu, free)) state.violation += (f.cpu - free) / f.cpu;
    state.cpu[site] -= f.cpu;
    if (site !== current.sites[fn]) {
      moved = true;
      state.moveCost += f.moveCost;
    }
  }
  let changed = false;
  const paths: number[][] = [];
  for (let tie = 0; tie < slice.ties.length; tie += 1) {
    const path = routeTie(problem, state, block, tie, sites);
    if (path === null || !samePath(path, current.paths[tie])) changed = true;
    if (record) paths.push(path ?? []);
  }
  if (moved) state.moved += 1;
  else if (changed) state.rerouted += 1;
  return record ? { sites: Array.from(sites.subarray(0, slice.functions.length)), paths } : null;
}

/** Books a given placement as it is (no routing), e.g. to see what a finished plan leaves free. */
export function bookPlacement(problem: RemapProblem, state: BookingState, slice: number, placement: SlicePlacement): void {
  const info = problem.inv.slices[slice];
  info.functions.forEach((f, fn) => { state.cpu[placement.sites[fn]] -= f.cpu; });
  info.ties.forEach((t, i) => bookPath(problem, state, placement.paths[i], t.bandwidthGbps));
}
