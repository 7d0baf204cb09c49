// The load every span would carry during a window if each touched slice simply took the obvious way round:
// a function on a down site moves to the nearest up site its anchor allows, and every tie whose path is cut
// (or whose end moved) takes its shortest-latency surviving path — bandwidth and latency budgets ignored.
// This is how the benchmark measures how scarce capacity is around a window: a peak utilisation ≥ 0.8 here
// means the shortest detours nearly fill (or overfill) some span, so a plan must find longer ones or make room.
import { greatCircleKm } from '../../planner/geo/great-circle';
import { satisfiesAnchor } from '../../planner/model/anchor';
import type { Inventory, SlicePlacement, WindowSpec } from '../../planner/model/types';
import { addPlacementLoad, windowCapacity } from '../../planner/model/window-capacity';
import { shortestLatencyPath } from '../../planner/paths/shortest-path';

export interface DetourLoad {
  /** load of the current placements */
  nowGbps: Float64Array;
  /** load during the window with the touched slices on their obvious detours (0 on down spans) */
  windowGbps: Float64Array;
  /** span capacity during the window (0 when down, × fraction when reduced) */
  capacityGbps: Float64Array;
  /** slices the window touches (a function on a down site or a tie crossing a down element), ascending */
  touched: number[];
  /** touched slices with no obvious detour at all (fixed or site-anchored on a down site, or cut off) */
  stranded: number[];
  /** the obvious detour of each touched slice (null when stranded) */
  detours: Map<number, SlicePlacement | null>;
}

function touches(inv: Inventory, slice: number, siteDown: Uint8Array, spanDown: Uint8Array): boolean {
  const p = inv.placements[slice];
  return p.sites.some((site) => siteDown[site] === 1) || p.paths.some((path) => path.some((span) => spanDown[span] === 1));
}

/** The nearest up site (great circle; index breaks ties) where the function may sit, or -1. */
function nearestUpSite(inv: Inventory, slice: number, fn: number, siteDown: Uint8Array): number {
  const f = inv.slices[slice].functions[fn];
  if (f.fixed) return -1;
  const sites = inv.network.sites;
  const from = sites[inv.placements[slice].sites[fn]];
  let best = -1;
  let bestKm = Infinity;
  for (const s of sites) {
    if (siteDown[s.index] || !satisfiesAnchor(inv.network, f.anchor, s.index)) continue;
    const km = greatCircleKm(from, s);
    if (km < bestKm) [best, bestKm] = [s.index, km];
  }
  return best;
}

/** The obvious detour of one touched slice, or null when it has none. */
function obviousDetour(inv: Inventory, slice: number, siteDown: Uint8Array, spanDown: Uint8Array): SlicePlacement | null {
  const now = inv.placements[slice];
  const sites = now.sites.map((site, fn) => (siteDown[site] ? nearestUpSite(inv, slice, fn, siteDown) : site));
  if (sites.includes(-1)) return null;
  const paths: number[][] = [];
  for (const [k, t] of inv.slices[slice].ties.entries()) {
    const moved = sites[t.from] !== now.sites[t.from] || sites[t.to] !== now.sites[t.to];
    if (!moved && !now.paths[k].some((span) => spanDown[span])) {
      paths.push(now.paths[k]);
      continue;
    }
    const path = shortestLatencyPath(inv.network, sites[t.from], sites[t.to], { siteDown, spanDown });
    if (!path) return null;
    paths.push(path.spans);
  }
  return { sites, paths };
}

export function detourLoad(inv: Inventory, window: WindowSpec): DetourLoad {
  const cap = windowCapacity(inv, window);
  const spans = inv.network.spans.length;
  const sites = inv.network.sites.length;
  const now = { siteCpu: new Float64Array(sites), spanGbps: new Float64Array(spans) };
  const during = { siteCpu: new Float64Array(sites), spanGbps: new Float64Array(spans) };
  const touched: number[] = [];
  const stranded: number[] = [];
  const detours = new Map<number, SlicePlacement | null>();
  for (let s = 0; s < inv.slices.length; s += 1) {
    addPlacementLoad(inv, s, inv.placements[s], now);
    if (!touches(inv, s, cap.siteDown, cap.spanDown)) {
      addPlacementLoad(inv, s, inv.placements[s], during);
      continue;
    }
    touched.push(s);
    const detour = obviousDetour(inv, s, cap.siteDown, cap.spanDown);
    detours.set(s, detour);
    if (detour) addPlacementLoad(inv, s, detour, during);
    else stranded.push(s);
  }
  return { nowGbps: now.spanGbps, windowGbps: during.spanGbps, capacityGbps: cap.spanGbps, touched, stranded, detours };
}

/** Highest utilisation over the spans that stay up, with the touched slices on their obvious detours. */
export function detourPeakUtilisation(inv: Inventory, window: WindowSpec): number {
  const d = detourLoad(inv, window);
  let peak = 0;
  for (let i = 0; i < d.windowGbps.length; i += 1) if (d.capacityGbps[i] > 0) peak = Math.max(peak, d.windowGbps[i] / d.capacityGbps[i]);
  return peak;
}
