// Baseline for benchmarks and tests: the affected set found by scanning every slice (no reverse index).
import { fits } from '../model/tolerance';
import type { Inventory, WindowSpec } from '../model/types';
import { placementLoad, windowCapacity } from '../model/window-capacity';

/** Same as assessImpact(...).needsReplacement (without reservations), in O(all placements). */
export function fullScanAffected(inv: Inventory, window: WindowSpec): number[] {
  const cap = windowCapacity(inv, window);
  const all = inv.slices.map((s) => s.index);
  const load = placementLoad(inv, all);
  const overSite = (i: number) => !cap.siteDown[i] && cap.siteCpu[i] < inv.network.sites[i].cpu && !fits(load.siteCpu[i], cap.siteCpu[i]);
  const overSpan = (i: number) => !cap.spanDown[i] && cap.spanGbps[i] < inv.network.spans[i].capacityGbps && !fits(load.spanGbps[i], cap.spanGbps[i]);
  return all.filter((s) => {
    const p = inv.placements[s];
    if (p.sites.some((site) => cap.siteDown[site] || overSite(site))) return true;
    return p.paths.some((path) => path.some((span) => cap.spanDown[span] || overSpan(span)));
  });
}
