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
  /** gbps minus the current paths of the slices not yet booked (see RemapProblem.protectedGbps) */
  protectedGbps: Float64Array;
  pathOptions: PathOptions;
  protectedOptions: PathOptions;
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
  const protectedGbps = Float64Array.from(problem.protectedGbps);
  return {
    cpu, gbps, protectedGbps,
    pathOptions: { spanDown: problem.spanDown, siteDown: problem.siteDown, residualGbps: gbps },
    protectedOptions: { spanDown: problem.spanDown, siteDown: problem.siteDown, residualGbps: protectedGbps },
    violation: 0, unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 0, moveCost: 0, usage: 0,
    peakUtilisation: problem.basePeakUtilisation,
  };
}

/** Back to the problem's residuals and zero totals, without allocating. */
export function resetBookingState(problem: RemapProblem, state: BookingState): void {
  state.cpu.set(problem.residualCpu);
  state.gbps.set(problem.residualGbps);
  state.protectedGbps.set(problem.protectedGbps);
  state.violation = 0;
  state.unresolvedWeight = 0;
  state.unresolved = 0;
  state.moved = 0;
  state.rerouted = 0;
  state.moveCost = 0;
  state.usage = 0;
  state.peakUtilisation = problem.basePeakUtilisation;
}

const TOTALS = 8;

/** A copy of the state's arrays and totals in one buffer (reused when `into` has the right size). */
export function saveBookingState(state: BookingState, into?: Float64Array): Float64Array {
  const a = state.cpu.length;
  const b = state.gbps.length;
  const out = into && into.length === a + 2 * b + TOTALS ? into : new Float64Array(a + 2 * b + TOTALS);
  out.set(state.cpu, 0);
  out.set(state.gbps, a);
  out.set(state.protectedGbps, a + b);
  const t = a + 2 * b;
  out[t] = state.violation; out[t + 1] = state.unresolvedWeight; out[t + 2] = state.unresolved; out[t + 3] = state.moved;
  out[t + 4] = state.rerouted; out[t + 5] = state.moveCost; out[t + 6] = state.usage; out[t + 7] = state.peakUtilisation;
  return out;
}

export function loadBookingState(state: BookingState, saved: Float64Array): void {
  const a = state.cpu.length;
  const b = state.gbps.length;
  state.cpu.set(saved.subarray(0, a));
  state.gbps.set(saved.subarray(a, a + b));
  state.protectedGbps.set(saved.subarray(a + b, a + 2 * b));
  const t = a + 2 * b;
  state.violation = saved[t]; state.unresolvedWeight = saved[t + 1]; state.unresolved = saved[t + 2]; state.moved = saved[t + 3];
  state.rerouted = saved[t + 4]; state.moveCost = saved[t + 5]; state.usage = saved[t + 6]; state.peakUtilisation = saved[t + 7];
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
    state.protectedGbps[span] -= gbps;
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
    // First around the current paths of the slices still to come, so they can keep theirs; then anywhere.
    for (const o of [state.protectedOptions, state.pathOptions]) {
      o.minGbps = t.bandwidthGbps;
      o.maxLatencyMs = t.maxLatencyMs;
    }
    path = shortestLatencyPath(problem.inv.network, from, to, state.protectedOptions)?.spans
      ?? shortestLatencyPath(problem.inv.network, from, to, state.pathOptions)?.spans ?? null;
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

/** The slice's turn has come: its current paths no longer need protecting from the others' new routes. */
export function releaseHeld(state: BookingState, block: RemapSlice): void {
  for (let i = 0; i < block.heldSpans.length; i += 1) state.protectedGbps[block.heldSpans[i]] += block.heldGbps[i];
}

/**
 * Books slice `block` on `sites` (one site per function). Over-full sites are booked anyway and counted
 * as violation (share of the demand that does not fit), so Deb's rules can steer away from them.
 * Returns the placement when `record`, else null.
 */
export function placeSlice(problem: RemapProblem, state: BookingState, block: RemapSlice, sites: Int32Array, record: boolean): SlicePlacement | null {
  releaseHeld(state, block);
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
