// The audit trail screen: filters, then the matching entries newest first a page at a time, or a plain empty
// state saying why nothing shows.
import { StyleSheet, Text, View } from 'react-native';
import type { AuditChoices, AuditPage } from '@/shared/audit';
import { PageColumn } from '@/components/page-column';
import { PageHeading } from '@/components/page-title';
import { Pager } from '@/components/table/pager';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { ZoneNote } from '@/components/time/zoned-when';
import { AuditEntryRow } from './audit-entry-row';
import { AuditFilterBar } from './audit-filter-bar';
import { hasFilters, rangeProblem, type AuditFilters } from './audit-filters';
import { colors, space, type } from '@/constants/theme';

type Props = {
  filters: AuditFilters;
  onFiltersChange: (filters: AuditFilters) => void;
  choices: AuditChoices | undefined;
  /** the page shown; undefined while the first one loads */
  data: AuditPage | undefined;
  error: string | null;
  onRetry: () => void;
  onPageChange: (page: number) => void;
  onDownload: () => void;
  timeZone: string;
};

function Entries({ data, filters, timeZone, onPageChange }: Pick<Props, 'filters' | 'timeZone' | 'onPageChange'> & { data: AuditPage }) {
  if (data.total === 0) {
    return hasFilters(filters)
      ? <EmptyState title="Nothing matches these filters" hint="Widen the date range or clear a filter to see more of the trail." />
      : <EmptyState title="Nothing recorded yet" hint="Bookings, plan runs, sign-off decisions, notices and account changes show up here as they happen." />;
  }
  return (
    <View testID="audit-list">
      <Text style={styles.count} testID="audit-count">{data.total === 1 ? '1 entry' : `${data.total} entries`}, newest first</Text>
      <View role="list">{data.items.map((e) => <AuditEntryRow key={e.id} entry={e} timeZone={timeZone} />)}</View>
      <Pager page={data.page} pageSize={data.pageSize} total={data.total} onPageChange={onPageChange} testID="audit-pager" />
    </View>
  );
}

export function AuditTrailView(p: Props) {
  let body;
  // The filter bar says what is wrong with the range; nothing is asked of the server until it is fixed.
  if (rangeProblem(p.filters)) body = null;
  else if (p.error && !p.data) body = <ErrorState message={p.error} onRetry={p.onRetry} />;
  else if (!p.data) body = <LoadingState label="Loading the audit trail…" />;
  else body = <Entries data={p.data} filters={p.filters} timeZone={p.timeZone} onPageChange={p.onPageChange} />;
  return (
    <PageColumn>
      <View style={styles.head} testID="audit-screen">
        <PageHeading>Audit trail</PageHeading>
        <Text style={styles.intro}>Every recorded action: who did it, when, to which window or object, and why. Nobody can change these entries.</Text>
        <ZoneNote timeZone={p.timeZone} />
      </View>
      <AuditFilterBar
        filters={p.filters} onChange={p.onFiltersChange} choices={p.choices} timeZone={p.timeZone}
        onDownload={p.onDownload} canDownload={(p.data?.total ?? 0) > 0}
      />
      {body}
    </PageColumn>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  intro: { ...type.body, color: colors.inkMuted },
  count: { ...type.caption, color: colors.inkMuted, paddingBottom: space.xs },
});
