// Sites: list rows with compute load, and the detail with spans and the slices that use the site.
import type { SiteDetail, SiteList, SiteListQuery, SiteRow } from '../../../shared/inventory';
import type { ScenarioSite } from '../../../shared/scenario';
import { InventoryNotFoundError } from './errors';
import { memoised, ratioOf, type InventoryView } from './inventory-view';
import { indexRows, pageIndexed, type IndexedRows } from './paging';
import { spanRow } from './span-rows';

function spanCounts(view: InventoryView): Map<string, number> {
  const counts = new Map<string, number>();
  for (const span of view.spans) {
    counts.set(span.a, (counts.get(span.a) ?? 0) + 1);
    counts.set(span.b, (counts.get(span.b) ?? 0) + 1);
  }
  return counts;
}

export function siteRow(view: InventoryView, site: ScenarioSite, spanCount: number): SiteRow {
  const cpuUsed = view.cpuUsed.get(site.id) ?? 0;
  return {
    id: site.id, name: site.name, kind: site.kind, lat: site.lat, lon: site.lon, cpu: site.cpu,
    cpuUsed, utilisation: ratioOf(cpuUsed, site.cpu),
    mtbfHours: site.mtbfHours ?? null, mttrHours: site.mttrHours ?? null,
    spanCount, sliceCount: view.uses.count('hosted', site.id),
  };
}

/** Every site row of the view, built once per view. */
function siteTable(view: InventoryView): IndexedRows<SiteRow> {
  return memoised(view, 'site-rows', () => {
    const counts = spanCounts(view);
    return indexRows(view.sites.map((s) => siteRow(view, s, counts.get(s.id) ?? 0)), (row) => `${row.id} ${row.name}`);
  });
}

export function listSites(view: InventoryView, query: SiteListQuery): SiteList {
  const kind = query.kind;
  return pageIndexed(siteTable(view), query, (row, key) => row[key], kind ? (row) => row.kind === kind : undefined);
}

export function getSiteDetail(view: InventoryView, id: string): SiteDetail {
  const site = view.siteById.get(id);
  if (!site) throw new InventoryNotFoundError('site', id);
  const spans = view.spans.filter((s) => s.a === id || s.b === id);
  return {
    site: siteRow(view, site, spans.length),
    spans: spans.map((s) => spanRow(view, s)),
    hosted: view.uses.list('hosted', id),
    transit: view.uses.list('transit', id),
  };
}
