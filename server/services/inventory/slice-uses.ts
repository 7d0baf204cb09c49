// Reverse index of the current placements: which slices use each site (hosted, transit) and each span.
import type { Scenario, ScenarioSlice, ScenarioSpan } from '../../../shared/scenario';
import type { SliceUse } from '../../../shared/inventory';

export interface UseIndex {
  hosted: Map<string, SliceUse[]>;
  transit: Map<string, SliceUse[]>;
  spans: Map<string, SliceUse[]>;
}

/** Sites a path visits, starting at `fromSite`; a span that does not continue the walk still contributes its far end. */
export function pathSites(fromSite: string, spanIds: readonly string[], spans: Map<string, ScenarioSpan>): string[] {
  const sites = [fromSite];
  let at = fromSite;
  for (const id of spanIds) {
    const span = spans.get(id);
    if (!span) continue;
    at = span.a === at ? span.b : span.b === at ? span.a : span.b;
    sites.push(at);
  }
  return sites;
}

function useOf(slice: ScenarioSlice, tenantName: string): SliceUse {
  return {
    sliceId: slice.id, sliceName: slice.name, tenantId: slice.tenant, tenantName,
    critical: slice.critical ?? false, functions: [], ties: [],
  };
}

/** Gets (or starts) this slice's entry in the list kept for one element. */
function entry(index: Map<string, SliceUse[]>, element: string, slice: ScenarioSlice, tenantName: string): SliceUse {
  const list = index.get(element) ?? [];
  if (!index.has(element)) index.set(element, list);
  let use = list[list.length - 1];
  if (use?.sliceId !== slice.id) { use = useOf(slice, tenantName); list.push(use); }
  return use;
}

/** Builds the index for the given slices (the ones the asker may see), walking each slice once. */
export function buildUseIndex(scenario: Scenario, slices: readonly ScenarioSlice[]): UseIndex {
  const index: UseIndex = { hosted: new Map(), transit: new Map(), spans: new Map() };
  const spans = new Map(scenario.spans.map((s) => [s.id, s]));
  const tenantNames = new Map(scenario.tenants.map((t) => [t.id, t.name]));
  const placements = new Map(scenario.placements.map((p) => [p.slice, p]));
  for (const slice of slices) {
    const p = placements.get(slice.id);
    if (!p) continue;
    const tenantName = tenantNames.get(slice.tenant) ?? slice.tenant;
    for (const f of slice.functions) {
      const site = p.sites[f.id];
      if (site) entry(index.hosted, site, slice, tenantName).functions.push({ id: f.id, name: f.name ?? null, cpu: f.cpu });
    }
    for (const t of slice.ties) {
      const path = p.paths[t.id] ?? [];
      const tie = { id: t.id, bandwidthGbps: t.bandwidthGbps };
      for (const spanId of path) entry(index.spans, spanId, slice, tenantName).ties.push(tie);
      const from = p.sites[t.from];
      // Interior sites of the path only: the ends host the tie's own functions.
      if (from) for (const site of pathSites(from, path, spans).slice(1, -1)) entry(index.transit, site, slice, tenantName).ties.push(tie);
    }
  }
  return index;
}
