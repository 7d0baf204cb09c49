// Candidate paths of one tie between two end sites during the window: the tie's current path first (when its
// end sites are unchanged and it still qualifies), then the k shortest-latency loopless paths (Yen) that are up,
// carry the tie's bandwidth on the residual network, meet its latency budget and its minimum availability.
// A tie's path gene picks among these (floor of the gene, the last path when fewer exist), so detours with
// spare capacity are reachable from the genome. Paths are searched for only when a gene or the repair asks.
import { fits } from '../model/tolerance';
import type { Inventory } from '../model/types';
import { pathEnumerator, type PathEnumerator } from '../paths/k-shortest';

/** Yen paths examined per catalogue entry wanted, at most (the current path and availability failures use some). */
const EXAMINED_PER_PATH = 3;

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

/** The paths of one tie between two end sites, listed lazily: a later path is searched for only when asked. */
export interface PathList {
  /** path `i`, or the last one there is when fewer exist; null when there is none at all */
  at(i: number): CandidatePath | null;
  /** how many paths there are, up to kPaths (lists them all) */
  count(): number;
  /** index of the path with these spans among the first kPaths, or -1 */
  indexOf(spans: readonly number[]): number;
}

export interface PathCatalog {
  /** paths of tie `tie` of slice `slice` between sites `from` and `to` (listed on demand, then cached) */
  get(slice: number, tie: number, from: number, to: number): PathList;
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

function createPathList(c: PathCatalogInput, slice: number, tie: number, from: number, to: number): PathList {
  const list: CandidatePath[] = [];
  let more: PathEnumerator | null = null;
  if (c.siteDown[from] || c.siteDown[to]) {
    // no path at all
  } else if (from === to) {
    list.push({ spans: [], latencyMs: 0 });
  } else {
    const t = c.inv.slices[slice].ties[tie];
    const current = c.inv.placements[slice];
    if (current.sites[t.from] === from && current.sites[t.to] === to) {
      const latencyMs = qualifies(c, slice, tie, current.paths[tie]);
      if (latencyMs !== null) list.push({ spans: current.paths[tie], latencyMs });
    }
    more = pathEnumerator(c.inv.network, from, to, {
      spanDown: c.spanDown, siteDown: c.siteDown, residualGbps: c.residualGbps, minGbps: t.bandwidthGbps, maxLatencyMs: t.maxLatencyMs,
    });
  }
  let examined = 0;
  /** Lists paths until there are `n` (or no more): Yen's next ones that qualify and are not listed yet. */
  const fill = (n: number) => {
    while (more !== null && list.length < Math.min(n, c.kPaths)) {
      // WARNING: bounds the search; paths failing only the availability floor could otherwise run through
      // every loopless path of a large network.
      const p = examined < EXAMINED_PER_PATH * c.kPaths ? more.next() : null;
      examined += 1;
      if (p === null) { more = null; break; }
      if (list.some((o) => samePath(o.spans, p.spans))) continue;
      const latencyMs = qualifies(c, slice, tie, p.spans);
      if (latencyMs !== null) list.push({ spans: p.spans, latencyMs });
    }
  };
  return {
    at(i) {
      fill(i + 1);
      return list.length === 0 ? null : list[Math.min(i, list.length - 1)];
    },
    count() {
      fill(c.kPaths);
      return list.length;
    },
    indexOf(spans) {
      fill(c.kPaths);
      return list.findIndex((o) => samePath(o.spans, spans));
    },
  };
}

export function createPathCatalog(c: PathCatalogInput): PathCatalog {
  const cache = new Map<string, PathList>();
  return {
    get(slice, tie, from, to) {
      const key = `${slice}|${tie}|${from}|${to}`;
      let list = cache.get(key);
      if (list === undefined) {
        list = createPathList(c, slice, tie, from, to);
        cache.set(key, list);
      }
      return list;
    },
  };
}
