// The sites list: search, kind filter, server-side sort and paging, utilisation as a bar.
import { useState } from 'react';
import { StyleSheet, Text } from 'react-native';
import { SITE_SORT_KEYS, type SiteRow } from '@/shared/inventory';
import { SITE_KINDS } from '@/shared/scenario';
import { useSitesQuery } from '@/hooks/queries/sites';
import { DataTable } from '@/components/table/data-table';
import { Pager } from '@/components/table/pager';
import { UtilisationBar } from '@/components/table/utilisation-bar';
import { serverTableProps, sortKeyIn, useServerTable } from '@/components/table/use-server-table';
import type { Column } from '@/components/table/types';
import { Segmented } from '@/components/inventory/segmented';
import { NameCell } from '@/components/inventory/name-cell';
import { formatCpu, siteKindLabel } from '@/components/inventory/format';
import { colors, type } from '@/constants/theme';

type Kind = (typeof SITE_KINDS)[number];
const PAGE_SIZE = 50;

const COLUMNS: Column<SiteRow>[] = [
  { key: 'name', label: 'Site', primary: true, flex: 2, sortable: true, render: (s) => <NameCell name={s.name} id={s.id} /> },
  { key: 'kind', label: 'Kind', flex: 1.3, sortable: true, render: (s) => siteKindLabel(s.kind) },
  { key: 'cpu', label: 'Compute', sortable: true, align: 'end', render: (s) => formatCpu(s.cpu) },
  { key: 'utilisation', label: 'Utilisation', flex: 1.6, sortable: true, render: (s) => <UtilisationBar share={s.utilisation} /> },
  { key: 'spanCount', label: 'Spans', sortable: true, align: 'end', hideInCards: true, minPaneWidthPx: 760, render: (s) => s.spanCount },
  { key: 'sliceCount', label: 'Slices', sortable: true, align: 'end', minPaneWidthPx: 660, render: (s) => s.sliceCount },
];

const KIND_CHOICES = [{ value: 'all', label: 'All kinds' }, ...SITE_KINDS.map((k) => ({ value: k, label: siteKindLabel(k) }))] as const;

export function SitesTable({ selectedId, onOpen }: { selectedId: string | null; onOpen: (id: string) => void }) {
  const table = useServerTable({ key: 'name', order: 'asc' });
  const [kind, setKind] = useState<Kind | 'all'>('all');
  const sites = useSitesQuery({
    page: table.page, pageSize: PAGE_SIZE, q: table.q, kind: kind === 'all' ? undefined : kind,
    sort: sortKeyIn(SITE_SORT_KEYS, table.sort.key, 'name'), order: table.sort.order,
  });
  const data = sites.data;
  return (
    <DataTable
      testID="sites-table"
      label="Sites"
      {...serverTableProps(table, sites)}
      columns={COLUMNS}
      rowKey={(s) => s.id}
      searchLabel="Search sites by name or id"
      onRowPress={(s) => onOpen(s.id)}
      selectedKey={selectedId}
      emptyTitle={table.q || kind !== 'all' ? 'No site matches' : 'No sites yet'}
      emptyHint={table.q || kind !== 'all' ? 'Try another search or kind.' : 'Import a scenario, a GraphML topology or a sites CSV.'}
      toolbar={
        <Segmented
          choices={KIND_CHOICES}
          value={kind}
          onChange={(value) => { setKind(value); table.setPage(1); }}
          testID="sites-kind"
          label="Site kind"
        />
      }
      footer={
        data ? (
          <>
            <Text style={styles.count} testID="sites-total">{`${data.total} ${data.total === 1 ? 'site' : 'sites'}`}</Text>
            <Pager page={data.page} pageSize={data.pageSize} total={data.total} onPageChange={table.setPage} testID="sites-pager" />
          </>
        ) : null
      }
    />
  );
}

const styles = StyleSheet.create({ count: { ...type.caption, color: colors.inkMuted } });
