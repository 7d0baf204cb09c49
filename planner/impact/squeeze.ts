// Finds elements whose current load (+ reservations) no longer fits their window capacity, via the reverse index.
import { fits } from '../model/tolerance';
import type { Inventory, Reservation } from '../model/types';
import type { WindowElements } from '../model/window-elements';
import type { ElementIndex } from './element-index';

export interface SqueezedElements {
  sites: number[];
  spans: number[];
}

function siteLoad(inv: Inventory, index: ElementIndex, site: number): number {
  let load = 0;
  for (let k = index.siteStart[site]; k < index.siteStart[site + 1]; k++) {
    load += inv.slices[index.siteSlice[k]].functions[index.siteFn[k]].cpu;
  }
  return load;
}

/** Current bandwidth on a span from the index (both directions share capacity). */
export function spanLoad(inv: Inventory, index: ElementIndex, span: number): number {
  let load = 0;
  for (let k = index.spanStart[span]; k < index.spanStart[span + 1]; k++) {
    load += inv.slices[index.spanSlice[k]].ties[index.spanTie[k]].bandwidthGbps;
  }
  return load;
}

function idsToIndices(ids: Record<string, number> | undefined, lookup: Map<string, number>): Map<number, number> {
  const out = new Map<number, number>();
  for (const [id, amount] of Object.entries(ids ?? {})) {
    const i = lookup.get(id);
    if (i !== undefined) out.set(i, amount);
  }
  return out;
}

/**
 * Reduced elements, and elements carrying a reservation, whose current load no longer fits.
 * Reserved elements are checked too: otherwise a plan could never pass verification there.
 */
export function findSqueezed(
  inv: Inventory, index: ElementIndex, w: WindowElements, siteDown: Uint8Array, spanDown: Uint8Array,
  reservations?: Reservation,
): SqueezedElements {
  const net = inv.network;
  const reservedCpu = idsToIndices(reservations?.siteCpu, net.siteIndex);
  const reservedGbps = idsToIndices(reservations?.spanGbps, net.spanIndex);
  const sites = new Set([...w.reducedSites.keys(), ...reservedCpu.keys()]);
  const spans = new Set([...w.reducedSpans.keys(), ...reservedGbps.keys()]);
  const out: SqueezedElements = { sites: [], spans: [] };
  for (const i of sites) {
    if (siteDown[i]) continue;
    const capacity = net.sites[i].cpu * (w.reducedSites.get(i) ?? 1);
    if (!fits(siteLoad(inv, index, i) + (reservedCpu.get(i) ?? 0), capacity)) out.sites.push(i);
  }
  for (const i of spans) {
    if (spanDown[i]) continue;
    const capacity = net.spans[i].capacityGbps * (w.reducedSpans.get(i) ?? 1);
    if (!fits(spanLoad(inv, index, i) + (reservedGbps.get(i) ?? 0), capacity)) out.spans.push(i);
  }
  return out;
}
