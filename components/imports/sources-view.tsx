// Where the preview's values came from: totals (file / defaults / derived), a per-field breakdown, then the values.
import { StyleSheet, Text, View } from 'react-native';
import { DataTable } from '@/components/table/data-table';
import type { Column } from '@/components/table/types';
import { useClientTable } from '@/components/table/use-client-table';
import { VALUE_SOURCE_NAMES, type ImportSources } from '@/shared/imports';
import { MAPPING_FIELDS } from './mapping-fields';
import { SOURCE_COUNT_LABELS } from './source-tag';
import { ValuesTables } from './values-tables';
import { colors, radii, space, type } from '@/constants/theme';

type FieldRow = ImportSources['fields'][number];

const EXTRA_FIELD_LABELS: Record<string, string> = { a: 'First end', b: 'Second end', id: 'Id' };

/** A field's name as the screen shows it, with its unit. */
export function fieldLabel(entity: 'sites' | 'spans', field: string): string {
  const known = MAPPING_FIELDS[entity === 'sites' ? 'site' : 'span'].find((f) => f.field === field);
  return known?.label ?? EXTRA_FIELD_LABELS[field] ?? field;
}

const count = (n: number) => `${n} ${n === 1 ? 'value' : 'values'}`;

const FIELD_COLUMNS: Column<FieldRow>[] = [
  { key: 'field', label: 'Field', primary: true, flex: 2, render: (r) => `${r.entity === 'sites' ? 'Site' : 'Span'} · ${fieldLabel(r.entity, r.field)}`,
    sortValue: (r) => `${r.entity} ${r.field}` },
  { key: 'file', label: 'From the file', align: 'end', render: (r) => count(r.file), sortValue: (r) => r.file },
  { key: 'default', label: 'From defaults', align: 'end', render: (r) => count(r.default), sortValue: (r) => r.default },
  { key: 'derived', label: 'Derived', align: 'end', render: (r) => count(r.derived), sortValue: (r) => r.derived },
];

const fieldSearch = (r: FieldRow) => `${r.entity} ${r.field} ${fieldLabel(r.entity, r.field)}`;

export function SourceCounts({ counts }: { counts: ImportSources['counts'] }) {
  return (
    <View style={styles.counts} testID="import-sources-counts">
      {VALUE_SOURCE_NAMES.map((source) => (
        <View key={source} style={styles.count} testID={`import-sources-count-${source}`}>
          <Text style={styles.countFigure}>{counts[source]}</Text>
          <Text style={styles.countLabel}>{SOURCE_COUNT_LABELS[source]}</Text>
        </View>
      ))}
    </View>
  );
}

function FieldBreakdown({ fields, layout }: { fields: readonly FieldRow[]; layout?: 'columns' | 'cards' }) {
  const table = useClientTable(fields, FIELD_COLUMNS, fieldSearch);
  return (
    <DataTable testID="import-sources-fields" label="Values per field and where they came from" rows={table.rows} columns={FIELD_COLUMNS}
      rowKey={(r) => `${r.entity}-${r.field}`} sort={table.sort} onSortChange={table.setSort}
      emptyTitle="No values to count" layout={layout} />
  );
}

type Props = { sources: ImportSources; siteNames?: ReadonlyMap<string, string>; layout?: 'columns' | 'cards' };

export function SourcesView({ sources, siteNames, layout }: Props) {
  return (
    <View style={styles.box} testID="import-sources">
      <Text style={styles.title} role="heading" aria-level={3}>Where the values come from</Text>
      <SourceCounts counts={sources.counts} />
      <FieldBreakdown fields={sources.fields} layout={layout} />
      <ValuesTables sources={sources} siteNames={siteNames} layout={layout} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  title: { ...type.heading, color: colors.ink },
  counts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  count: { minWidth: 96, backgroundColor: colors.tide, borderRadius: radii.md, paddingVertical: space.sm, paddingHorizontal: space.md },
  countFigure: { ...type.title, color: colors.ink },
  countLabel: { ...type.caption, color: colors.inkMuted },
});
