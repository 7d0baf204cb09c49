// Random slices with current placements on a network, in the style of common VNE evaluation set-ups.
// Reference: M. Yu, Y. Yi, J. Rexford, M. Chiang, CCR 38(2), 2008 (memory): requests of a few nodes,
// CPU U[0, 20], bandwidth U[0, 50]; here 2–5 functions per slice, demands rescaled afterwards (load-scaling).
import type { ScenarioFunction, ScenarioPlacement, ScenarioSlice, ScenarioTie } from '../../shared/scenario';
import type { NetworkModel } from '../../planner/model/types';
import { shortestLatencyPath } from '../../planner/paths/shortest-path';
import { randomInt, type Rng } from '../../planner/random/rng';

export interface LoadedSlices {
  slices: ScenarioSlice[];
  placements: ScenarioPlacement[];
  /** span indices of each tie's current path, parallel to slices[i].ties */
  pathSpans: number[][][];
  /** site index of each function, parallel to slices[i].functions */
  functionSites: number[][];
}

export interface SliceLoaderOptions {
  count: number;
  tenants: string[];
  /** share of slices with a lat/lon/radius anchor on their first function */
  anchorShare: number;
  /** share of slices whose first function is fixed */
  fixedShare: number;
  /** share of ties with a minimum availability */
  availabilityShare: number;
}

const SSTS = [1, 2, 3, 4];

/** Sites within `hops` of `home` (home first, then by discovery order): where a slice's functions live. */
export function neighbourhood(net: NetworkModel, home: number, hops: number): number[] {
  const seen = new Set([home]);
  let frontier = [home];
  for (let h = 0; h < hops; h += 1) {
    const next: number[] = [];
    for (const s of frontier) {
      for (let k = net.adjStart[s]; k < net.adjStart[s + 1]; k += 1) {
        const t = net.adjSite[k];
        if (!seen.has(t)) {
          seen.add(t);
          next.push(t);
        }
      }
    }
    frontier = next;
  }
  return [...seen];
}

function pathAvailability(net: NetworkModel, spans: number[]): number {
  return spans.reduce((a, s) => a * net.spans[s].availability, 1);
}

export function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

function makeFunctions(id: string, count: number, rng: Rng, opts: SliceLoaderOptions, net: NetworkModel, sites: number[]): ScenarioFunction[] {
  return sites.slice(0, count).map((site, i) => {
    const f: ScenarioFunction = { id: `${id}.f${i + 1}`, cpu: round(1 + rng() * 19, 3), moveCost: 1 + randomInt(rng, 10) };
    if (i === 0 && rng() < opts.anchorShare) {
      // Anchored around the site it sits on now, so the current placement honours the anchor.
      f.anchor = { lat: net.sites[site].lat, lon: net.sites[site].lon, radiusKm: round(20 + rng() * 80, 1) };
    }
    if (i === 0 && rng() < opts.fixedShare) f.fixed = true;
    return f;
  });
}

/** Ties in a chain f1–f2–…, and now and then one closing the ring (three functions or more). */
export function tieEnds(count: number, rng: Rng): [number, number][] {
  const ends: [number, number][] = [];
  for (let i = 1; i < count; i += 1) ends.push([i - 1, i]);
  if (count >= 3 && rng() < 0.3) ends.push([0, count - 1]);
  return ends;
}

function makeSlice(index: number, net: NetworkModel, rng: Rng, opts: SliceLoaderOptions) {
  const id = `slice-${String(index + 1).padStart(5, '0')}`;
  const count = 2 + randomInt(rng, 4);
  const near = neighbourhood(net, randomInt(rng, net.sites.length), 2);
  const sites = Array.from({ length: count }, () => near[randomInt(rng, near.length)]);
  const functions = makeFunctions(id, count, rng, opts, net, sites);
  const ties: ScenarioTie[] = [];
  const paths: number[][] = [];
  for (const [from, to] of tieEnds(count, rng)) {
    const path = shortestLatencyPath(net, sites[from], sites[to]);
    if (!path) throw new Error('generated network is not connected');
    // Latency budget with head-room over the current path, so a detour can still be feasible.
    const maxLatencyMs = round(path.latencyMs * (1.5 + rng()) + 0.5 + rng() * 2, 3);
    const tie: ScenarioTie = {
      id: `${id}.t${ties.length + 1}`, from: functions[from].id, to: functions[to].id,
      bandwidthGbps: round(1 + rng() * 49, 3), maxLatencyMs,
    };
    if (rng() < opts.availabilityShare) {
      // Rounded down so the current path always meets it.
      const floor = Math.floor((pathAvailability(net, path.spans) - 0.0005 - rng() * 0.003) * 1e6) / 1e6;
      if (floor > 0.5) tie.minAvailability = floor;
    }
    ties.push(tie);
    paths.push(path.spans);
  }
  const sst = SSTS[randomInt(rng, SSTS.length)];
  const slice: ScenarioSlice = {
    id, tenant: opts.tenants[randomInt(rng, opts.tenants.length)], name: `Slice ${index + 1}`, sst,
    priority: 1 + randomInt(rng, 5), critical: rng() < 0.05, functions, ties,
  };
  return { slice, sites, paths };
}

type MadeSlice = { slice: LoadedSlices['slices'][number]; sites: LoadedSlices['functionSites'][number]; paths: LoadedSlices['pathSpans'][number] };

/** `count` slices from `make`, then each one's placement on `net` (shared by every slice generator). */
export function collectSlices(net: NetworkModel, count: number, make: (index: number) => MadeSlice): LoadedSlices {
  const out: LoadedSlices = { slices: [], placements: [], pathSpans: [], functionSites: [] };
  for (let i = 0; i < count; i += 1) {
    const { slice, sites, paths } = make(i);
    out.slices.push(slice);
    out.functionSites.push(sites);
    out.pathSpans.push(paths);
  }
  for (let i = 0; i < out.slices.length; i += 1) out.placements.push(placementOf(net, out, i));
  return out;
}

/** Slices with placements on `net` (routed on the shortest-latency path); demands are rescaled later. */
export function loadSlices(net: NetworkModel, rng: Rng, opts: SliceLoaderOptions): LoadedSlices {
  return collectSlices(net, opts.count, (i) => makeSlice(i, net, rng, opts));
}

export function placementOf(net: NetworkModel, loaded: LoadedSlices, i: number): ScenarioPlacement {
  const s = loaded.slices[i];
  const sites: Record<string, string> = {};
  s.functions.forEach((f, k) => (sites[f.id] = net.sites[loaded.functionSites[i][k]].id));
  const paths: Record<string, string[]> = {};
  s.ties.forEach((t, k) => (paths[t.id] = loaded.pathSpans[i][k].map((span) => net.spans[span].id)));
  return { slice: s.id, sites, paths };
}
