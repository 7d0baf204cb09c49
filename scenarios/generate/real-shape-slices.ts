// Slices with current placements for the real-shape benchmark networks: 2–5 functions around a home site, ties
// on the shortest-latency path, and latency budgets of 1.3–3 × the current path's latency, so a detour fits
// some ties and not others. Demands are invented; the capacities are dimensioned afterwards (scarce-capacity).
import type { ScenarioFunction, ScenarioSlice, ScenarioTie } from '../../shared/scenario';
import type { NetworkModel } from '../../planner/model/types';
import { shortestLatencyPath } from '../../planner/paths/shortest-path';
import { randomInt, type Rng } from '../../planner/random/rng';
import { collectSlices, neighbourhood, round, tieEnds, type LoadedSlices } from './slice-loader';

export interface RealShapeSliceOptions {
  count: number;
  tenants: string[];
  /** share of slices whose first function has an anchor */
  anchorShare?: number;
  /** share of those anchors that name a site (the rest a point and radius) */
  siteAnchorShare?: number;
  /** share of slices whose first function is fixed */
  fixedShare?: number;
  /** share of ties with a minimum availability */
  availabilityShare?: number;
  /** latency budget as a multiple of the current path's latency */
  budgetFactor?: { lo: number; hi: number };
}

export const REAL_SHAPE_SLICE_DEFAULTS = {
  anchorShare: 0.25,
  siteAnchorShare: 0.3,
  fixedShare: 0.05,
  availabilityShare: 0.2,
  budgetFactor: { lo: 1.3, hi: 3 },
};

/**
 * Latency a budget is scaled from when both ends share a site (current latency 0): 0.25 ms, about 50 km of
 * fibre — invented, so co-located functions may still move a little way apart.
 */
const BUDGET_FLOOR_MS = 0.25;
const SSTS = [1, 2, 3, 4];

type Options = RealShapeSliceOptions & typeof REAL_SHAPE_SLICE_DEFAULTS;

const ceil = (x: number, digits: number) => Math.ceil(x * 10 ** digits) / 10 ** digits;

/** Home first, then sites within two hops, distinct where the neighbourhood allows. */
function functionSites(net: NetworkModel, count: number, rng: Rng): number[] {
  const home = randomInt(rng, net.sites.length);
  const near = neighbourhood(net, home, 2).slice(1);
  const sites = [home];
  while (sites.length < count) {
    const fresh = near.filter((s) => !sites.includes(s));
    const pool = fresh.length > 0 ? fresh : near.length > 0 ? near : [home];
    sites.push(pool[randomInt(rng, pool.length)]);
  }
  return sites;
}

function makeFunctions(id: string, sites: number[], net: NetworkModel, rng: Rng, o: Options): ScenarioFunction[] {
  return sites.map((site, i) => {
    const f: ScenarioFunction = { id: `${id}.f${i + 1}`, cpu: round(1 + rng() * 7, 3), moveCost: 1 + randomInt(rng, 10) };
    if (i === 0 && rng() < o.anchorShare) {
      // Anchored where it sits now, so the current placement honours the anchor.
      f.anchor = rng() < o.siteAnchorShare
        ? { site: net.sites[site].id }
        : { lat: net.sites[site].lat, lon: net.sites[site].lon, radiusKm: round(20 + rng() * 60, 1) };
    }
    if (i === 0 && rng() < o.fixedShare) f.fixed = true;
    return f;
  });
}

function makeTie(id: string, from: ScenarioFunction, to: ScenarioFunction, spans: number[], latencyMs: number, net: NetworkModel, rng: Rng, o: Options): ScenarioTie {
  const factor = o.budgetFactor.lo + rng() * (o.budgetFactor.hi - o.budgetFactor.lo);
  const tie: ScenarioTie = {
    id, from: from.id, to: to.id, bandwidthGbps: round(0.5 + rng() * 9.5, 3),
    // Rounded up so the current path always meets its budget.
    maxLatencyMs: ceil(Math.max(latencyMs, BUDGET_FLOOR_MS) * factor, 3),
  };
  if (rng() < o.availabilityShare) {
    const availability = spans.reduce((a, s) => a * net.spans[s].availability, 1);
    // Rounded down so the current path always meets it; a little head-room lets some detours meet it too.
    const floor = Math.floor((availability - 0.0005 - rng() * 0.003) * 1e6) / 1e6;
    if (floor > 0.5) tie.minAvailability = floor;
  }
  return tie;
}

function makeSlice(index: number, net: NetworkModel, rng: Rng, o: Options) {
  const id = `slice-${String(index + 1).padStart(5, '0')}`;
  const sites = functionSites(net, 2 + randomInt(rng, 4), rng);
  const functions = makeFunctions(id, sites, net, rng, o);
  const ties: ScenarioTie[] = [];
  const paths: number[][] = [];
  for (const [from, to] of tieEnds(sites.length, rng)) {
    const path = shortestLatencyPath(net, sites[from], sites[to]);
    if (!path) throw new Error('generated network is not connected');
    ties.push(makeTie(`${id}.t${ties.length + 1}`, functions[from], functions[to], path.spans, path.latencyMs, net, rng, o));
    paths.push(path.spans);
  }
  const slice: ScenarioSlice = {
    id, tenant: o.tenants[randomInt(rng, o.tenants.length)], name: `Slice ${index + 1}`, sst: SSTS[randomInt(rng, SSTS.length)],
    priority: 1 + randomInt(rng, 5), critical: rng() < 0.05, functions, ties,
  };
  return { slice, sites, paths };
}

/** `count` slices placed on `net`; deterministic for the rng's seed. */
export function loadRealShapeSlices(net: NetworkModel, rng: Rng, options: RealShapeSliceOptions): LoadedSlices {
  const o: Options = { ...REAL_SHAPE_SLICE_DEFAULTS, ...options };
  return collectSlices(net, o.count, (i) => makeSlice(i, net, rng, o));
}
