// Capacity of every site and span during a window, and the load that given slices place on them today.
import { UnknownElementError } from '../errors';
import type { Inventory, Reservation, SlicePlacement, WindowSpec } from './types';
import { resolveWindow } from './window-elements';

export interface WindowCapacity {
  siteCpu: Float64Array;
  spanGbps: Float64Array;
  siteDown: Uint8Array;
  spanDown: Uint8Array;
}

export interface PlacementLoad {
  siteCpu: Float64Array;
  spanGbps: Float64Array;
}

function subtractReservations(
  into: Float64Array, reserved: Record<string, number> | undefined, index: Map<string, number>, what: string,
): void {
  if (reserved === undefined) return;
  for (const [id, amount] of Object.entries(reserved)) {
    const i = index.get(id);
    if (i === undefined) throw new UnknownElementError(`reservation names unknown ${what} "${id}"`);
    into[i] = Math.max(0, into[i] - amount);
  }
}

/** Down elements get 0 and a flag (a down site takes every span touching it down); reduced ones × fraction. */
export function windowCapacity(inv: Inventory, window: WindowSpec, reservations?: Reservation): WindowCapacity {
  const net = inv.network;
  const w = resolveWindow(net, window);
  const siteCpu = Float64Array.from(net.sites, (s) => s.cpu);
  const spanGbps = Float64Array.from(net.spans, (s) => s.capacityGbps);
  const siteDown = new Uint8Array(net.sites.length);
  const spanDown = new Uint8Array(net.spans.length);
  for (const [i, f] of w.reducedSites) siteCpu[i] *= f;
  for (const [i, f] of w.reducedSpans) spanGbps[i] *= f;
  subtractReservations(siteCpu, reservations?.siteCpu, net.siteIndex, 'site');
  subtractReservations(spanGbps, reservations?.spanGbps, net.spanIndex, 'span');
  for (const i of w.downSites) siteDown[i] = 1;
  for (const i of w.downSpans) spanDown[i] = 1;
  for (const span of net.spans) {
    if (siteDown[span.a] || siteDown[span.b]) spanDown[span.index] = 1;
  }
  for (let i = 0; i < siteDown.length; i++) if (siteDown[i]) siteCpu[i] = 0;
  for (let i = 0; i < spanDown.length; i++) if (spanDown[i]) spanGbps[i] = 0;
  return { siteCpu, spanGbps, siteDown, spanDown };
}

/** Adds one slice's placement (any placement, current or planned) to a load tally. */
export function addPlacementLoad(inv: Inventory, sliceIndex: number, placement: SlicePlacement, into: PlacementLoad): void {
  const slice = inv.slices[sliceIndex];
  slice.functions.forEach((f, i) => { into.siteCpu[placement.sites[i]] += f.cpu; });
  slice.ties.forEach((t, i) => {
    for (const span of placement.paths[i]) into.spanGbps[span] += t.bandwidthGbps;
  });
}

/** Sum of the CURRENT placements of the given slices (span capacity is shared by both directions). */
export function placementLoad(inv: Inventory, sliceIndices: Iterable<number>): PlacementLoad {
  const load: PlacementLoad = {
    siteCpu: new Float64Array(inv.network.sites.length),
    spanGbps: new Float64Array(inv.network.spans.length),
  };
  for (const s of sliceIndices) addPlacementLoad(inv, s, inv.placements[s], load);
  return load;
}
