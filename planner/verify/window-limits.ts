// The verifier's own account of what every site and span offers during a window, kept apart from the planner's
// window-capacity so that one bug cannot pass both the planner and its check.
import type { Inventory, Reservation, WindowSpec } from '../model/types';
import { resolveWindow } from '../model/window-elements';
import type { Violation } from './violation';

export interface WindowLimits {
  /** vCPU each site offers during the window (0 when down) */
  siteCpu: Float64Array;
  /** Gbit/s each span offers during the window (0 when down) */
  spanGbps: Float64Array;
  siteDown: Uint8Array;
  spanDown: Uint8Array;
}

/** Subtracts reserved amounts (floor 0); an id the network lacks is a finding, not a crash, so the caller sees all. */
function subtractReserved(
  into: Float64Array, reserved: Record<string, number> | undefined, index: Map<string, number>, what: string,
  out: Violation[],
): void {
  for (const [id, amount] of Object.entries(reserved ?? {})) {
    const i = index.get(id);
    if (i === undefined) out.push({ code: 'unknown-element', message: `reservation names unknown ${what} "${id}"` });
    else into[i] = Math.max(0, into[i] - amount);
  }
}

/**
 * Reduced elements offer capacity × fraction, minus reservations, never below 0. A down element offers 0, and a
 * down site takes every span touching it down with it. Unknown window elements throw (UnknownElementError).
 */
export function windowLimits(inv: Inventory, window: WindowSpec, reservations: Reservation | undefined, out: Violation[]): WindowLimits {
  const { sites, spans, siteIndex, spanIndex } = inv.network;
  const w = resolveWindow(inv.network, window);
  const siteCpu = new Float64Array(sites.length);
  const spanGbps = new Float64Array(spans.length);
  sites.forEach((site, i) => { siteCpu[i] = site.cpu * (w.reducedSites.get(i) ?? 1); });
  spans.forEach((span, i) => { spanGbps[i] = span.capacityGbps * (w.reducedSpans.get(i) ?? 1); });
  subtractReserved(siteCpu, reservations?.siteCpu, siteIndex, 'site', out);
  subtractReserved(spanGbps, reservations?.spanGbps, spanIndex, 'span', out);
  const siteDown = new Uint8Array(sites.length);
  const spanDown = new Uint8Array(spans.length);
  for (const i of w.downSites) siteDown[i] = 1;
  for (const i of w.downSpans) spanDown[i] = 1;
  spans.forEach((span, i) => { if (siteDown[span.a] || siteDown[span.b]) spanDown[i] = 1; });
  siteDown.forEach((down, i) => { if (down) siteCpu[i] = 0; });
  spanDown.forEach((down, i) => { if (down) spanGbps[i] = 0; });
  return { siteCpu, spanGbps, siteDown, spanDown };
}
