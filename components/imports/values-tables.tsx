// The file's sites and spans with their values, each value tagged by where it came from; the first rows, then "Show all".
import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { formatCpu, formatGbps, formatKm, formatMs, siteKindLabel } from '@/components/inventory/format';
import { DataTable } from '@/components/table/data-table';
import type { Column } from '@/components/table/types';
import { useClientTable } from '@/components/table/use-client-table';
import type { ImportSources, ValueSource } from '@/shared/imports';
import { SITE_KINDS } from '@/shared/scenario';
import { SourcedValue } from './source-tag';
import { colors, space, type } from '@/constants/theme';

/** Rows shown before "Show all", so a file of a few hundred sites keeps the preview short. */
export const SHOWN_VALUE_ROWS = 20;

type Sources = Record<string, ValueSource>;
type Num = number | null | undefined;
export type SiteValueRow = { id: string; name: string; kind: string | null; cpu: Num; lat: Num; lon: Num; src: Sources };
export type SpanValueRow = { id: string; ends: string; capacityGbps: Num; lengthKm: Num; latencyMs: Num; src: Sources };

const num = (value: Num, format: (n: number) => string) => (typeof value === 'number' ? format(value) : null);
const degrees = (n: number) => `${Number(n.toFixed(4))}°`;
const kindText = (kind: string | null) => (kind && (SITE_KINDS as readonly string[]).includes(kind) ? siteKindLabel(kind as (typeof SITE_KINDS)[number]) : kind);

/** Rows for every site and span the preview has values or sources for; names stand in for ids wherever known. */
export function valueRows(sources: ImportSources, siteNames?: ReadonlyMap<string, string>): { sites: SiteValueRow[]; spans: SpanValueRow[] } {
  const siteItems = new Map((sources.items?.sites ?? []).map((s) => [s.id, s]));
  const spanItems = new Map((sources.items?.spans ?? []).map((s) => [s.id, s]));
  const nameOf = (id: string | null | undefined) => (id ? siteItems.get(id)?.name ?? siteNames?.get(id) ?? id : '?');
  const ids = (values: Record<string, unknown>, items: Map<string, unknown>) => [...new Set([...items.keys(), ...Object.keys(values)])];
  const sites = ids(sources.values.sites, siteItems).map((id) => {
    const item = siteItems.get(id);
    return { id, name: nameOf(id), kind: item?.kind ?? null, cpu: item?.cpu, lat: item?.lat, lon: item?.lon, src: sources.values.sites[id] ?? {} };
  });
  const spans = ids(sources.values.spans, spanItems).map((id) => {
    const item = spanItems.get(id);
    const ends = item ? `${item.aName ?? nameOf(item.a)} — ${item.bName ?? nameOf(item.b)}` : id;
    return { id, ends, capacityGbps: item?.capacityGbps, lengthKm: item?.lengthKm, latencyMs: item?.latencyMs, src: sources.values.spans[id] ?? {} };
  });
  return { sites, spans };
}

const cell = <T extends { id: string; src: Sources }>(field: string, text: (row: T) => string | null) =>
  (row: T) => <SourcedValue text={text(row)} source={row.src[field]} testID={`import-value-${row.id}-${field}`} />;

const SITE_COLUMNS: Column<SiteValueRow>[] = [
  { key: 'name', label: 'Site', primary: true, flex: 2, render: cell('name', (r) => r.name), sortValue: (r) => r.name },
  { key: 'kind', label: 'Kind', render: cell('kind', (r) => kindText(r.kind)), sortValue: (r) => r.kind },
  { key: 'cpu', label: 'Compute (vCPU)', render: cell('cpu', (r) => num(r.cpu, formatCpu)), sortValue: (r) => r.cpu },
  { key: 'lat', label: 'Latitude (°)', render: cell('lat', (r) => num(r.lat, degrees)), sortValue: (r) => r.lat },
  { key: 'lon', label: 'Longitude (°)', render: cell('lon', (r) => num(r.lon, degrees)), sortValue: (r) => r.lon },
];

const SPAN_COLUMNS: Column<SpanValueRow>[] = [
  { key: 'ends', label: 'Span (between sites)', primary: true, flex: 2, render: (r) => r.ends, sortValue: (r) => r.ends },
  { key: 'capacityGbps', label: 'Capacity (Gbit/s)', render: cell('capacityGbps', (r) => num(r.capacityGbps, formatGbps)), sortValue: (r) => r.capacityGbps },
  { key: 'lengthKm', label: 'Length (km)', render: cell('lengthKm', (r) => num(r.lengthKm, formatKm)), sortValue: (r) => r.lengthKm },
  { key: 'latencyMs', label: 'Latency (ms)', render: cell('latencyMs', (r) => num(r.latencyMs, formatMs)), sortValue: (r) => r.latencyMs },
];

function LimitedTable<T extends { id: string }>({ rows, columns, title, noun, testID, search, layout }: {
  rows: T[]; columns: Column<T>[]; title: string; noun: string; testID: string; search: (row: T) => string; layout?: 'columns' | 'cards';
}) {
  const [all, setAll] = useState(false);
  const table = useClientTable(rows, columns, search);
  const shown = all ? table.rows : table.rows.slice(0, SHOWN_VALUE_ROWS);
  const hidden = table.rows.length - shown.length;
  return (
    <View style={styles.group}>
      <Text style={styles.title} role="heading" aria-level={4}>{`${title} (${rows.length})`}</Text>
      <DataTable testID={testID} label={title} rows={shown} columns={columns} rowKey={(r) => r.id} sort={table.sort} onSortChange={table.setSort}
        query={table.query} onQueryChange={table.setQuery} searchLabel={`Search ${noun}`} emptyTitle={`No ${noun} match`} layout={layout}
        footer={hidden > 0 ? <Button label={`Show all ${table.rows.length} ${noun}`} variant="quiet" testID={`${testID}-show-all`} onPress={() => setAll(true)} /> : null} />
    </View>
  );
}

type Props = { sources: ImportSources; siteNames?: ReadonlyMap<string, string>; layout?: 'columns' | 'cards' };

export function ValuesTables({ sources, siteNames, layout }: Props) {
  const rows = useMemo(() => valueRows(sources, siteNames), [sources, siteNames]);
  return (
    <View style={styles.box} testID="import-values">
      {sources.items ? null : (
        <Text style={styles.hint}>This preview records where each value came from, not the values themselves.</Text>
      )}
      {rows.sites.length > 0 ? (
        <LimitedTable rows={rows.sites} columns={SITE_COLUMNS} title="Sites in the file" noun="sites" testID="import-values-sites"
          search={(r) => `${r.name} ${r.kind ?? ''}`} layout={layout} />
      ) : null}
      {rows.spans.length > 0 ? (
        <LimitedTable rows={rows.spans} columns={SPAN_COLUMNS} title="Spans in the file" noun="spans" testID="import-values-spans"
          search={(r) => r.ends} layout={layout} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  group: { gap: space.xs },
  title: { ...type.bodyStrong, color: colors.ink },
  hint: { ...type.caption, color: colors.inkMuted },
});
