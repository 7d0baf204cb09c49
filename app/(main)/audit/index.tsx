// Audit trail (admin, approver): every recorded action, filtered by window, person, action and days, newest first,
// with the filtered rows as CSV. An address such as /audit?window=<id> opens with that window picked.
import { useState } from 'react';
import { Linking } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import { canReadAuditTrail } from '@/shared/permissions';
import { useMeQuery } from '@/hooks/queries/me';
import { auditCsvUrl, useAuditChoicesQuery, useAuditPageQuery } from '@/hooks/queries/audit';
import { EmptyState } from '@/components/screen-states';
import { usePageTitle } from '@/components/page-title';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { AuditTrailView } from '@/components/audit/audit-trail-view';
import { auditParams, NO_FILTERS, rangeProblem, type AuditFilters } from '@/components/audit/audit-filters';

export default function AuditScreen() {
  usePageTitle('Audit trail');
  const { window } = useLocalSearchParams<{ window?: string }>();
  const allowed = canReadAuditTrail(useMeQuery().data?.roles ?? []);
  const timeZone = useViewerTimeZone();
  const [filters, setFilters] = useState<AuditFilters>({ ...NO_FILTERS, window: window || null });
  const [page, setPage] = useState(1);
  const params = auditParams(filters, timeZone);
  const entries = useAuditPageQuery(params, page, allowed && rangeProblem(filters) === null);
  const choices = useAuditChoicesQuery(allowed);

  if (!allowed) return <EmptyState page title="The audit trail is for admins and approvers" hint="Ask an admin if you need to know who changed something." />;
  return (
    <AuditTrailView
      filters={filters}
      onFiltersChange={(next) => { setFilters(next); setPage(1); }}
      choices={choices.data}
      data={entries.data}
      error={entries.isError ? entries.error.message : null}
      onRetry={() => void entries.refetch()}
      onPageChange={setPage}
      onDownload={() => void Linking.openURL(auditCsvUrl(params))}
      timeZone={timeZone}
    />
  );
}
