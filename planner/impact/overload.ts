// "If nothing clever happened": spans that run over capacity once cut ties reroute on the plain shortest path.
import { fits } from '../model/tolerance';
import type { Inventory, Reservation } from '../model/types';
import type { WindowCapacity } from '../model/window-capacity';
import { shortestLatencyPath } from '../paths/shortest-path';
import type { ElementIndex } from './element-index';
import { spanLoad } from './squeeze';

export interface OverloadedSpan {
  span: string;
  loadGbps: number;
  capacityGbps: number;
}

/** A tie that loses its path: [slice, tie]. */
export type CutTie = [number, number];

/**
 * Cut ties with both end sites up follow the shortest-latency path ignoring capacity; cut ties with an end site
 * down simply stop. `cap` is the window capacity WITHOUT reservations (they are added to the load here).
 */
export function findOverloaded(
  inv: Inventory, index: ElementIndex, cap: WindowCapacity, cut: CutTie[], reducedSpans: Iterable<number>,
  reservations?: Reservation,
): OverloadedSpan[] {
  const net = inv.network;
  const delta = new Map<number, number>();
  const add = (span: number, gbps: number) => delta.set(span, (delta.get(span) ?? 0) + gbps);
  const candidates = new Set<number>(reducedSpans);
  const opts = { siteDown: cap.siteDown, spanDown: cap.spanDown };
  for (const [s, t] of cut) {
    const placement = inv.placements[s];
    const tie = inv.slices[s].ties[t];
    for (const span of placement.paths[t]) add(span, -tie.bandwidthGbps);
    const from = placement.sites[tie.from];
    const to = placement.sites[tie.to];
    if (cap.siteDown[from] || cap.siteDown[to]) continue;
    const detour = shortestLatencyPath(net, from, to, opts);
    if (detour === null) continue;
    for (const span of detour.spans) {
      add(span, tie.bandwidthGbps);
      candidates.add(span);
    }
  }
  for (const id of Object.keys(reservations?.spanGbps ?? {})) {
    const i = net.spanIndex.get(id);
    if (i !== undefined) candidates.add(i);
  }
  const out: OverloadedSpan[] = [];
  for (const i of [...candidates].sort((a, b) => a - b)) {
    if (cap.spanDown[i]) continue;
    const reserved = reservations?.spanGbps?.[net.spans[i].id] ?? 0;
    const loadGbps = spanLoad(inv, index, i) + (delta.get(i) ?? 0) + reserved;
    if (!fits(loadGbps, cap.spanGbps[i])) out.push({ span: net.spans[i].id, loadGbps, capacityGbps: cap.spanGbps[i] });
  }
  return out;
}
