// The map's sites and spans in words, for the list beside the map and the SVG's text alternative:
// "Orrindale, core site, CPU 40 % used" and "Orrindale — Bexley, span, 100 Gbit/s, 62 % used".
import { formatUtilisation } from '@/components/map/colour-scale';
import type { MapSite, MapSiteKind, MapSpan, NetworkMapData } from '@/components/map/map-types';
import { KIND_LABELS, KIND_ORDER } from '@/components/map/site-glyphs';

export function siteLoadText(site: Pick<MapSite, 'cpuUtilisation'>): string {
  return site.cpuUtilisation == null ? 'no CPU figure' : `CPU ${formatUtilisation(site.cpuUtilisation)} used`;
}

export function spanLoadText(span: Pick<MapSpan, 'capacityGbps' | 'utilisation'>): string {
  const used = span.utilisation == null ? 'no load figure' : `${formatUtilisation(span.utilisation)} used`;
  return `${span.capacityGbps} Gbit/s, ${used}`;
}

/** "core site, CPU 40 % used" */
export function siteDetail(site: MapSite): string {
  return `${KIND_LABELS[site.kind].toLowerCase()}${site.kind === 'cell-site' ? '' : ' site'}, ${siteLoadText(site)}`;
}


/** A span by the names of its two sites (ids only where a site is missing from the data). */
export function spanName(span: MapSpan, siteNames: ReadonlyMap<string, string>): string {
  return `${siteNames.get(span.a) ?? span.a} — ${siteNames.get(span.b) ?? span.b}`;
}

/** "span, 100 Gbit/s, 62 % used" */
export function spanDetail(span: MapSpan): string {
  return `span, ${spanLoadText(span)}`;
}


export type MapElementGroup =
  | { kind: 'sites'; siteKind: MapSiteKind; title: string; sites: MapSite[] }
  | { kind: 'spans'; title: string; spans: MapSpan[] };

const GROUP_TITLES: Record<MapSiteKind, string> = {
  core: 'Core sites', aggregation: 'Aggregation sites', edge: 'Edge sites', 'cell-site': 'Cell sites',
};

/** Every site and span the map draws, sites grouped by kind (biggest first) then spans, each group by name. */
export function mapElementGroups(data: NetworkMapData): MapElementGroup[] {
  const byName = (a: { name: string }, b: { name: string }) => a.name.localeCompare(b.name);
  const names = new Map(data.sites.map((s) => [s.id, s.name]));
  const groups: MapElementGroup[] = KIND_ORDER.map((siteKind) => ({
    kind: 'sites' as const, siteKind, title: GROUP_TITLES[siteKind],
    sites: data.sites.filter((s) => s.kind === siteKind).sort(byName),
  })).filter((g) => g.sites.length > 0);
  const spans = [...data.spans].sort((a, b) => spanName(a, names).localeCompare(spanName(b, names)));
  return spans.length > 0 ? [...groups, { kind: 'spans', title: 'Spans', spans }] : groups;
}
