// Knock-on candidates: slices the window does not touch that sit on the elements blocking touched slices.
// The candidate set grows from those elements through the reverse index (not from the whole network), so large
// networks stay fast: a touched tie's few shortest surviving routes and a displaced function's nearest sites
// are read, spans and sites where the touched slices' demand exceeds what is left are "blocking", and the
// untouched slices on them are ranked by how much room moving them would free.
import { greatCircleKm } from '../geo/great-circle';
import { elementIndexFor } from '../impact/element-index';
import { satisfiesAnchor } from '../model/anchor';
import { fits } from '../model/tolerance';
import type { AnchorInfo, Inventory } from '../model/types';
import { kShortestPaths } from '../paths/k-shortest';

export interface KnockOnInput {
  inv: Inventory;
  siteDown: Uint8Array;
  spanDown: Uint8Array;
  /** capacity left during the window once every untouched slice keeps its current placement */
  residualCpu: Float64Array;
  residualGbps: Float64Array;
  /** touched slice indices */
  affected: readonly number[];
}

/** Routes per touched tie and nearest sites per displaced function that are read for blocking elements. */
const ROUTES_READ = 3;
const SITES_READ = 4;
/**
 * Above this many touched slices each touched tie's shortest route alone is read: the candidates are capped at a
 * few dozen anyway, and three routes per tie of a window touching thousands of slices took seconds of the run's
 * time limit (tens of thousands of path searches) before the search began.
 */
const MANY_TOUCHED = 200;

/**
 * Answers of one candidate search, kept by their inputs: a window on a busy site displaces thousands of functions
 * from the same site to the same few neighbours, and route and site searches on a 1,000-site network would
 * otherwise repeat for every one of them (they were most of a big window's problem build).
 */
interface Memo {
  routes: Map<string, number[]>;
  near: Map<string, number[]>;
  likely: Map<string, number>;
}

function anchorKey(anchor: AnchorInfo | undefined): string {
  if (anchor === undefined) return '-';
  return 'site' in anchor ? `s${anchor.site}` : `p${anchor.lat},${anchor.lon},${anchor.radiusKm}`;
}

/** Where a touched function sits during the window: its own site when up, else the nearest up site its anchor allows. */
function likelySites(k: KnockOnInput, slice: number, memo: Memo): number[] {
  const { sites } = k.inv.network;
  return k.inv.slices[slice].functions.map((f, fn) => {
    const current = k.inv.placements[slice].sites[fn];
    if (!k.siteDown[current]) return current;
    const key = `${current}|${anchorKey(f.anchor)}`;
    const known = memo.likely.get(key);
    if (known !== undefined) return known;
    let best = -1;
    let bestKm = Infinity;
    for (let i = 0; i < sites.length; i += 1) {
      if (k.siteDown[i] || !satisfiesAnchor(k.inv.network, f.anchor, i)) continue;
      const km = greatCircleKm(sites[current], sites[i]);
      if (km < bestKm) { best = i; bestKm = km; }
    }
    memo.likely.set(key, best);
    return best;
  });
}

/** Demand per element from the touched slices that may want it; an element is blocking where it exceeds what is left. */
type Demand = Map<number, number>;

const want = (d: Demand, x: number, amount: number) => d.set(x, (d.get(x) ?? 0) + amount);

/** Up sites nearest to a displaced function's site that its anchor allows: each may be wanted for its vCPU. */
function wantedSites(k: KnockOnInput, slice: number, fn: number, into: Demand, memo: Memo): void {
  const f = k.inv.slices[slice].functions[fn];
  const site = k.inv.placements[slice].sites[fn];
  const key = `${site}|${anchorKey(f.anchor)}`;
  let near = memo.near.get(key);
  if (near === undefined) {
    const from = k.inv.network.sites[site];
    near = k.inv.network.sites
      .filter((s) => !k.siteDown[s.index] && satisfiesAnchor(k.inv.network, f.anchor, s.index))
      .sort((a, b) => greatCircleKm(from, a) - greatCircleKm(from, b) || a.index - b.index)
      .slice(0, SITES_READ)
      .map((s) => s.index);
    memo.near.set(key, near);
  }
  for (const s of near) want(into, s, f.cpu);
}

/** Spans of each touched tie's few shortest surviving routes: each may be wanted for the tie's bandwidth. */
function wantedSpans(k: KnockOnInput, slice: number, ends: number[], into: Demand, memo: Memo): void {
  const routesRead = k.affected.length > MANY_TOUCHED ? 1 : ROUTES_READ;
  k.inv.slices[slice].ties.forEach((t) => {
    const from = ends[t.from];
    const to = ends[t.to];
    if (from < 0 || to < 0 || from === to) return;
    const key = `${from}|${to}|${t.maxLatencyMs}`;
    let spans = memo.routes.get(key);
    if (spans === undefined) {
      const routes = kShortestPaths(k.inv.network, from, to, routesRead, {
        spanDown: k.spanDown, siteDown: k.siteDown, maxLatencyMs: t.maxLatencyMs,
      });
      spans = [...new Set(routes.flatMap((r) => r.spans))];
      memo.routes.set(key, spans);
    }
    for (const x of spans) want(into, x, t.bandwidthGbps);
  });
}

function blocking(d: Demand, residual: Float64Array): number[] {
  return [...d.entries()].filter(([x, amount]) => !fits(amount, residual[x])).map(([x]) => x);
}

/** Up to `limit` untouched slices on blocking elements, most room freed first (index breaks ties). */
export function knockOnCandidates(k: KnockOnInput, limit: number): number[] {
  if (limit <= 0 || k.affected.length === 0) return [];
  const touched = new Set(k.affected);
  const spanDemand: Demand = new Map();
  const siteDemand: Demand = new Map();
  const memo: Memo = { routes: new Map(), near: new Map(), likely: new Map() };
  for (const s of k.affected) {
    k.inv.placements[s].sites.forEach((site, fn) => { if (k.siteDown[site]) wantedSites(k, s, fn, siteDemand, memo); });
    wantedSpans(k, s, likelySites(k, s, memo), spanDemand, memo);
  }
  const spans = blocking(spanDemand, k.residualGbps);
  const sites = blocking(siteDemand, k.residualCpu);
  const index = elementIndexFor(k.inv);
  const score = new Map<number, number>();
  const credit = (slice: number, amount: number) => {
    if (!touched.has(slice)) score.set(slice, (score.get(slice) ?? 0) + amount);
  };
  for (const x of spans) {
    for (let i = index.spanStart[x]; i < index.spanStart[x + 1]; i += 1) {
      const slice = index.spanSlice[i];
      credit(slice, k.inv.slices[slice].ties[index.spanTie[i]].bandwidthGbps / Math.max(1e-9, k.inv.network.spans[x].capacityGbps));
    }
  }
  for (const x of sites) {
    for (let i = index.siteStart[x]; i < index.siteStart[x + 1]; i += 1) {
      const slice = index.siteSlice[i];
      const f = k.inv.slices[slice].functions[index.siteFn[i]];
      if (!f.fixed) credit(slice, f.cpu / Math.max(1e-9, k.inv.network.sites[x].cpu));
    }
  }
  return [...score.entries()].sort((a, b) => b[1] - a[1] || a[0] - b[0]).slice(0, limit).map(([s]) => s).sort((a, b) => a - b);
}
