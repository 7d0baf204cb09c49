// Per-slice risk during a window: chance that an element it still uses fails unplanned, and lost protection.
// Reference: exponential failure model P = 1 − Π exp(−T/MTBFᵢ) (common practice; ITU-T E.800 defines availability).
import { InvalidOptionError } from '../errors';
import { findBridges } from '../impact/bridges';
import { sliceSeverity, type Severity } from '../impact/severity';
import type { Inventory, NetworkModel, SlicePlacement, WindowSpec } from '../model/types';
import { windowCapacity } from '../model/window-capacity';

export interface SliceRisk {
  slice: string;
  failureProbability: number;
  unprotected: boolean;
  severity: Severity;
}

/** Sites and spans a placement relies on: function sites, every span on a path and the sites along it. */
function elementsUsed(net: NetworkModel, p: SlicePlacement): { sites: Set<number>; spans: Set<number> } {
  const sites = new Set(p.sites);
  const spans = new Set<number>();
  for (const path of p.paths) {
    for (const x of path) {
      spans.add(x);
      sites.add(net.spans[x].a);
      sites.add(net.spans[x].b);
    }
  }
  return { sites, spans };
}

function failureRate(mtbfHours: number | undefined): number {
  return mtbfHours !== undefined && mtbfHours > 0 ? 1 / mtbfHours : 0;
}

/**
 * Risk for every slice in service during the window: planned placement for slices in `next`, current one
 * for the rest. Unresolved slices (null) are out of service and left to the plan's review, so they are omitted.
 * Unprotected = a path span that is a bridge during the window but was not one in the full network.
 */
export function sliceRisk(inv: Inventory, window: WindowSpec, next: Map<number, SlicePlacement | null>): SliceRisk[] {
  const hours = window.durationHours;
  if (hours === undefined || !(hours >= 0)) throw new InvalidOptionError(`window "${window.id}" has no duration`);
  const net = inv.network;
  const cap = windowCapacity(inv, window);
  const fullBridges = findBridges(net);
  const windowBridges = findBridges(net, cap);
  const out: SliceRisk[] = [];
  for (const slice of inv.slices) {
    const placement = next.has(slice.index) ? next.get(slice.index) : inv.placements[slice.index];
    if (!placement) continue;
    const used = elementsUsed(net, placement);
    let rate = 0;
    for (const s of used.sites) rate += failureRate(net.sites[s].mtbfHours);
    for (const x of used.spans) rate += failureRate(net.spans[x].mtbfHours);
    const unprotected = [...used.spans].some((x) => windowBridges[x] === 1 && fullBridges[x] === 0);
    out.push({
      slice: slice.id,
      // Π exp(−T/MTBFᵢ) = exp(−T Σ 1/MTBFᵢ); expm1 keeps precision for short windows.
      failureProbability: -Math.expm1(-hours * rate),
      unprotected,
      severity: sliceSeverity(slice, unprotected),
    });
  }
  return out;
}
