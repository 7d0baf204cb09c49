// Candidate paths of one tie between two candidate end sites, for the integer program.
// On tiny networks every simple path is listed (so the integer optimum is the true optimum over the
// candidate sites); otherwise the k shortest bandwidth-feasible paths (Yen), plus the current path.
import { fits } from '../model/tolerance';
import { allSimplePaths, kShortestPaths } from '../paths/k-shortest';
import type { PathOptions } from '../paths/shortest-path';
import type { RemapProblem } from '../remap/remap-types';

export interface PathOption {
  /** span indices from the `from` function's site */
  spans: number[];
  latencyMs: number;
  /** differs from the tie's current path (costs REROUTE_COST) */
  changed: boolean;
}

export interface PathSetting {
  /** k of Yen's algorithm when not every path is listed */
  kPaths: number;
  /** list every simple path when a pair has at most this many; above it, fall back to k shortest */
  maxAllPaths: number;
  /** WARNING: only networks up to this many sites try full enumeration — the depth-first search behind it
   * can explode on larger ones long before it finds maxAllPaths paths */
  allPathsMaxSites: number;
}

export interface TiePaths {
  options: PathOption[];
  /** every simple path meeting the tie's limits is among the options */
  complete: boolean;
}

function samePath(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((s, i) => s === b[i]);
}

function availabilityOf(problem: RemapProblem, spans: readonly number[]): number {
  let a = 1;
  for (const s of spans) a *= problem.inv.network.spans[s].availability;
  return a;
}

/** Meets the tie's own limits during the window: up, bandwidth fits the residual alone, latency, availability. */
function admissible(problem: RemapProblem, slice: number, tie: number, spans: readonly number[]): number | null {
  const t = problem.inv.slices[slice].ties[tie];
  let latencyMs = 0;
  for (const s of spans) {
    const span = problem.inv.network.spans[s];
    if (problem.spanDown[s] || problem.siteDown[span.a] || problem.siteDown[span.b]) return null;
    if (!fits(t.bandwidthGbps, problem.residualGbps[s])) return null;
    latencyMs += span.latencyMs;
  }
  if (latencyMs > t.maxLatencyMs) return null;
  if (t.minAvailability !== undefined && availabilityOf(problem, spans) < t.minAvailability) return null;
  return latencyMs;
}

function addPath(problem: RemapProblem, slice: number, tie: number, options: PathOption[], spans: readonly number[]): void {
  if (options.some((o) => samePath(o.spans, spans))) return;
  const latencyMs = admissible(problem, slice, tie, spans);
  const current = problem.inv.placements[slice].paths[tie];
  if (latencyMs !== null) options.push({ spans: [...spans], latencyMs, changed: !samePath(spans, current) });
}

/** Paths for the tie between sites `from` and `to`; `extra` (a start solution's path) is added when admissible. */
export function tiePaths(
  problem: RemapProblem, slice: number, tie: number, from: number, to: number, setting: PathSetting, extra?: readonly number[],
): TiePaths {
  const t = problem.inv.slices[slice].ties[tie];
  const current = problem.inv.placements[slice];
  const currentPath = current.paths[tie];
  if (from === to) {
    // Both ends on one site: the empty path is the only sensible route.
    return { options: [{ spans: [], latencyMs: 0, changed: currentPath.length !== 0 }], complete: true };
  }
  const opts: PathOptions = {
    spanDown: problem.spanDown, siteDown: problem.siteDown, residualGbps: problem.residualGbps,
    minGbps: t.bandwidthGbps, maxLatencyMs: t.maxLatencyMs,
  };
  const net = problem.inv.network;
  const tiny = net.sites.length <= setting.allPathsMaxSites;
  let found = tiny ? allSimplePaths(net, from, to, { ...opts, maxPaths: setting.maxAllPaths + 1 }) : [];
  const complete = tiny && found.length <= setting.maxAllPaths;
  if (!complete) found = kShortestPaths(net, from, to, setting.kPaths, opts);
  const options: PathOption[] = [];
  for (const p of found) {
    const latencyMs = admissible(problem, slice, tie, p.spans);
    if (latencyMs !== null) options.push({ spans: p.spans, latencyMs, changed: !samePath(p.spans, currentPath) });
  }
  // The decoder keeps a surviving current path; the program must be able to as well.
  if (from === current.sites[t.from] && to === current.sites[t.to]) addPath(problem, slice, tie, options, currentPath);
  if (extra) addPath(problem, slice, tie, options, extra);
  return { options, complete };
}
