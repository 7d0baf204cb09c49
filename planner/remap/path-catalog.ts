// Candidate paths of one tie between two end sites during the window: the tie's current path first (when its
// end sites are unchanged and it still qualifies), then the k shortest-latency loopless paths (Yen) that are up,
// carry the tie's bandwidth on the residual network, meet its latency budget and its minimum availability.
// A tie's path gene picks among these, so detours with spare capacity are reachable from the genome.
import { fits } from '../model/tolerance';
import type { Inventory } from '../model/types';
import { kShortestPaths } from '../paths/k-shortest';

export interface CandidatePath {
  /** span indices from the `from` site */
  spans: number[];
  latencyMs: number;
}

export interface PathCatalogInput {
  inv: Inventory;
  siteDown: Uint8Array;
  spanDown: Uint8Array;
  /** capacity left for the re-mapped slices: a path must carry the tie alone */
  residualGbps: Float64Array;
  kPaths: number;
}

export interface PathCatalog {
  /** paths of tie `tie` of slice `slice` between sites `from` and `to` (computed once, then cached) */
  get(slice: number, tie: number, from: number, to: number): readonly CandidatePath[];
}

function samePath(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return false;
  return true;
}

/** Latency of `spans` when it qualifies for the tie during the window, else null. */
function qualifies(c: PathCatalogInput, slice: number, tie: number, spans: readonly number[]): number | null {
  const t = c.inv.slices[slice].ties[tie];
  const net = c.inv.network;
  let latencyMs = 0;
  let availability = 1;
  for (const x of spans) {
    const span = net.spans[x];
    if (c.spanDown[x] || c.siteDown[span.a] || c.siteDown[span.b] || !fits(t.bandwidthGbps, c.residualGbps[x])) return null;
    latencyMs += span.latencyMs;
    availability *= span.availability;
  }
  if (latencyMs > t.maxLatencyMs) return null;
  if (t.minAvailability !== undefined && availability < t.minAvailability) return null;
  return latencyMs;
}

function listPaths(c: PathCatalogInput, slice: number, tie: number, from: number, to: number): CandidatePath[] {
  if (c.siteDown[from] || c.siteDown[to]) return [];
  if (from === to) return [{ spans: [], latencyMs: 0 }];
  const t = c.inv.slices[slice].ties[tie];
  const current = c.inv.placements[slice];
  const out: CandidatePath[] = [];
  const currentPath = current.paths[tie];
  if (current.sites[t.from] === from && current.sites[t.to] === to) {
    const latencyMs = qualifies(c, slice, tie, currentPath);
    if (latencyMs !== null) out.push({ spans: currentPath, latencyMs });
  }
  const found = kShortestPaths(c.inv.network, from, to, c.kPaths, {
    spanDown: c.spanDown, siteDown: c.siteDown, residualGbps: c.residualGbps, minGbps: t.bandwidthGbps, maxLatencyMs: t.maxLatencyMs,
  });
  for (const p of found) {
    if (out.length >= c.kPaths) break;
    if (out.some((o) => samePath(o.spans, p.spans))) continue;
    const latencyMs = qualifies(c, slice, tie, p.spans);
    if (latencyMs !== null) out.push({ spans: p.spans, latencyMs });
  }
  return out;
}

export function createPathCatalog(c: PathCatalogInput): PathCatalog {
  const cache = new Map<string, CandidatePath[]>();
  return {
    get(slice, tie, from, to) {
      const key = `${slice}|${tie}|${from}|${to}`;
      let list = cache.get(key);
      if (list === undefined) {
        list = listPaths(c, slice, tie, from, to);
        cache.set(key, list);
      }
      return list;
    },
  };
}
