// The slices list: by tenant, service type (SST), S-NSSAI, priority and critical, with filters; the API sorts and pages.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { SLICE_SORT_KEYS, type SliceRow } from '@/shared/inventory';
import { useSlicesQuery } from '@/hooks/queries/slices';
import { DataTable } from '@/components/table/data-table';
import { Pager } from '@/components/table/pager';
import { serverTableProps, sortKeyIn, useServerTable } from '@/components/table/use-server-table';
import type { Column } from '@/components/table/types';
import { CriticalBadge } from '@/components/inventory/badges';
import { NameCell } from '@/components/inventory/name-cell';
import { Segmented } from '@/components/inventory/segmented';
import { TenantFilter } from '@/components/inventory/tenant-filter';
import { formatSnssai, sstName } from '@/components/inventory/format';
import { colors, space, type } from '@/constants/theme';

const PAGE_SIZE = 50;

const COLUMNS: Column<SliceRow>[] = [
  {
    key: 'name', label: 'Slice', primary: true, flex: 2.2, sortable: true,
    render: (s) => <NameCell name={s.name} id={s.id} badge={s.critical ? <CriticalBadge testID={`slice-critical-${s.id}`} /> : null} />,
  },
  { key: 'tenant', label: 'Tenant', flex: 1.5, sortable: true, render: (s) => s.tenantName },
  { key: 'sst', label: 'Service', sortable: true, render: (s) => sstName(s.sst) },
  { key: 'snssai', label: 'S-NSSAI', minPaneWidthPx: 680, render: (s) => formatSnssai(s.sst, s.sd) },
  { key: 'priority', label: 'Priority', sortable: true, align: 'end', render: (s) => s.priority },
];

const SST_CHOICES = [
  { value: 'all', label: 'All services' },
  ...[1, 2, 3, 4].map((sst) => ({ value: String(sst), label: sstName(sst) })),
] as const;
const CRITICAL_CHOICES = [{ value: 'all', label: 'Any' }, { value: 'critical', label: 'Critical only' }] as const;

export function SlicesTable({ selectedId, onOpen }: { selectedId: string | null; onOpen: (id: string) => void }) {
  const table = useServerTable({ key: 'name', order: 'asc' });
  const [tenant, setTenant] = useState<string | null>(null);
  const [sst, setSst] = useState<string>('all');
  const [critical, setCritical] = useState<string>('all');
  const slices = useSlicesQuery({
    page: table.page, pageSize: PAGE_SIZE, q: table.q,
    sort: sortKeyIn(SLICE_SORT_KEYS, table.sort.key, 'name'), order: table.sort.order,
    tenant: tenant ?? undefined, sst: sst === 'all' ? undefined : Number(sst), critical: critical === 'critical' ? true : undefined,
  });
  const filtered = table.q !== undefined || tenant !== null || sst !== 'all' || critical !== 'all';
  const refilter = <V,>(set: (v: V) => void) => (value: V) => { set(value); table.setPage(1); };
  const data = slices.data;
  return (
    <DataTable
      testID="slices-table"
      label="Slices"
      {...serverTableProps(table, slices)}
      columns={COLUMNS}
      rowKey={(s) => s.id}
      searchLabel="Search slices by name or id"
      onRowPress={(s) => onOpen(s.id)}
      selectedKey={selectedId}
      emptyTitle={filtered ? 'No slice matches' : 'No slices yet'}
      emptyHint={filtered ? 'Try other filters.' : 'Import a scenario or a slices CSV.'}
      toolbar={
        <View style={styles.filters}>
          <TenantFilter value={tenant} onChange={refilter(setTenant)} />
          <Segmented choices={SST_CHOICES} value={sst} onChange={refilter(setSst)} testID="slices-sst" label="Service type" />
          <Segmented choices={CRITICAL_CHOICES} value={critical} onChange={refilter(setCritical)} testID="slices-critical" label="Critical" />
        </View>
      }
      footer={
        data ? (
          <>
            <Text style={styles.count} testID="slices-total">{`${data.total} ${data.total === 1 ? 'slice' : 'slices'}`}</Text>
            <Pager page={data.page} pageSize={data.pageSize} total={data.total} onPageChange={table.setPage} testID="slices-pager" />
          </>
        ) : null
      }
    />
  );
}

const styles = StyleSheet.create({
  filters: { gap: space.xs },
  count: { ...type.caption, color: colors.inkMuted },
});
