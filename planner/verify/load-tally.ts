// The verifier's own tally of the vCPU per site and Gbit/s per span that a plan leaves on the network.
import type { Inventory, SlicePlacement } from '../model/types';

export interface LoadTally {
  siteCpu: Float64Array;
  spanGbps: Float64Array;
}

/**
 * Every slice counts: one with an entry at its planned placement (none when that is null: unresolved or not
 * mappable), every other at its current placement. A span is shared by both directions, and a path that
 * crosses a span twice claims it twice.
 */
export function tallyLoad(inv: Inventory, planned: ReadonlyMap<number, SlicePlacement | null>): LoadTally {
  const siteCpu = new Float64Array(inv.network.sites.length);
  const spanGbps = new Float64Array(inv.network.spans.length);
  for (const slice of inv.slices) {
    const placement = planned.has(slice.index) ? planned.get(slice.index) : inv.placements[slice.index];
    if (!placement) continue;
    slice.functions.forEach((f, i) => { siteCpu[placement.sites[i]] += f.cpu; });
    slice.ties.forEach((t, i) => {
      for (const span of placement.paths[i]) spanGbps[span] += t.bandwidthGbps;
    });
  }
  return { siteCpu, spanGbps };
}
