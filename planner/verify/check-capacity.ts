// Capacity findings: the tallied load on each site and span against what the window leaves it.
import type { Inventory } from '../model/types';
import type { LoadTally } from './load-tally';
import type { Violation } from './violation';
import type { WindowLimits } from './window-limits';

/**
 * Relative slack for floating-point sums. WARNING: must stay as loose as the planner's own (1e-9), or the verifier
 * rejects plans the planner rightly built at exactly full capacity.
 */
export const VERIFY_CAPACITY_TOLERANCE = 1e-9;

/** load fits within capacity: load ≤ capacity + tolerance × max(1, |capacity|). */
export function withinCapacity(load: number, capacity: number): boolean {
  return load <= capacity + VERIFY_CAPACITY_TOLERANCE * Math.max(1, Math.abs(capacity));
}

/** Down elements are left to the slice checks ('down-element' or 'missing-slice'), not reported again here. */
export function checkCapacity(inv: Inventory, limits: WindowLimits, load: LoadTally, out: Violation[]): void {
  inv.network.sites.forEach((site, i) => {
    if (!limits.siteDown[i] && load.siteCpu[i] > 0 && !withinCapacity(load.siteCpu[i], limits.siteCpu[i])) {
      out.push({ code: 'cpu-capacity', message: `site "${site.id}" needs ${load.siteCpu[i]} vCPU of ${limits.siteCpu[i]}` });
    }
  });
  inv.network.spans.forEach((span, i) => {
    if (!limits.spanDown[i] && load.spanGbps[i] > 0 && !withinCapacity(load.spanGbps[i], limits.spanGbps[i])) {
      out.push({ code: 'bandwidth-capacity', message: `span "${span.id}" needs ${load.spanGbps[i]} Gbit/s of ${limits.spanGbps[i]}` });
    }
  });
}
