// The spans list: ends, capacity, length, latency and utilisation, sorted and searched by the API.
import { StyleSheet, Text, View } from 'react-native';
import { SPAN_SORT_KEYS, type SpanRow } from '@/shared/inventory';
import { useSpansQuery } from '@/hooks/queries/spans';
import { DataTable } from '@/components/table/data-table';
import { Pager } from '@/components/table/pager';
import { UtilisationBar } from '@/components/table/utilisation-bar';
import { serverTableProps, sortKeyIn, useServerTable } from '@/components/table/use-server-table';
import type { Column } from '@/components/table/types';
import { formatGbps, formatKm, formatMs } from '@/components/inventory/format';
import { colors, type } from '@/constants/theme';

const PAGE_SIZE = 50;

function Ends({ span }: { span: SpanRow }) {
  return (
    <View>
      <Text style={styles.strong} numberOfLines={2}>{`${span.aName} – ${span.bName}`}</Text>
      <Text style={styles.caption}>{span.id}</Text>
    </View>
  );
}

/** Latency derived from length is marked, so nobody mistakes the planning value for a measurement. */
export function latencyLabel(span: Pick<SpanRow, 'latencyMs' | 'latencyDerived'>): string {
  return span.latencyDerived ? `≈ ${formatMs(span.latencyMs)}` : formatMs(span.latencyMs);
}

const COLUMNS: Column<SpanRow>[] = [
  { key: 'a', label: 'Ends', primary: true, flex: 2.2, sortable: true, render: (s) => <Ends span={s} /> },
  { key: 'capacityGbps', label: 'Capacity', sortable: true, align: 'end', render: (s) => formatGbps(s.capacityGbps) },
  { key: 'lengthKm', label: 'Length', sortable: true, align: 'end', minPaneWidthPx: 680, render: (s) => formatKm(s.lengthKm) },
  { key: 'latencyMs', label: 'Latency', sortable: true, align: 'end', render: latencyLabel },
  { key: 'utilisation', label: 'Utilisation', flex: 1.6, sortable: true, render: (s) => <UtilisationBar share={s.utilisation} /> },
  { key: 'sliceCount', label: 'Slices', sortable: true, align: 'end', hideInCards: true, minPaneWidthPx: 760, render: (s) => s.sliceCount },
];

export function SpansTable({ selectedId, onOpen }: { selectedId: string | null; onOpen: (id: string) => void }) {
  const table = useServerTable({ key: 'a', order: 'asc' });
  const spans = useSpansQuery({
    page: table.page, pageSize: PAGE_SIZE, q: table.q,
    sort: sortKeyIn(SPAN_SORT_KEYS, table.sort.key, 'id'), order: table.sort.order,
  });
  const data = spans.data;
  return (
    <DataTable
      testID="spans-table"
      label="Spans"
      {...serverTableProps(table, spans)}
      columns={COLUMNS}
      rowKey={(s) => s.id}
      searchLabel="Search spans by id or site"
      onRowPress={(s) => onOpen(s.id)}
      selectedKey={selectedId}
      emptyTitle={table.q ? 'No span matches' : 'No spans yet'}
      emptyHint={table.q ? 'Try another search.' : 'Import a scenario, a GraphML topology or a spans CSV.'}
      footer={
        data ? (
          <>
            <Text style={styles.caption} testID="spans-total">{`${data.total} ${data.total === 1 ? 'span' : 'spans'}`}</Text>
            <Pager page={data.page} pageSize={data.pageSize} total={data.total} onPageChange={table.setPage} testID="spans-pager" />
          </>
        ) : null
      }
    />
  );
}

const styles = StyleSheet.create({
  strong: { ...type.bodyStrong, color: colors.ink },
  caption: { ...type.caption, color: colors.inkMuted },
});
