// Demo data (admin): remove the invented demo network, windows and accounts from a running instance.
import { useMeQuery } from '@/hooks/queries/me';
import { useDemoDataQuery, useDemoRemovalMutation } from '@/hooks/queries/demo-data';
import { canAdminister } from '@/shared/permissions';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { DemoDataPanel, DemoRemovalResultView } from '@/components/demo-data/demo-data-panel';
import { PageColumn } from '@/components/page-column';
import { usePageTitle } from '@/components/page-title';

export default function DemoDataScreen() {
  const me = useMeQuery();
  const allowed = canAdminister(me.data?.roles ?? []);
  const summary = useDemoDataQuery({ enabled: allowed });
  const removal = useDemoRemovalMutation();
  usePageTitle('Demo data');
  if (me.data && !allowed) return <EmptyState page title="Demo data is for admins" hint="Ask an admin to remove the demo data." />;
  // The result first: after the removal the refreshed summary is empty, and the result must stay on screen.
  if (removal.data) {
    return <PageColumn narrow><DemoRemovalResultView result={removal.data} /></PageColumn>;
  }
  if (summary.isError) return <ErrorState message={summary.error.message} onRetry={() => void summary.refetch()} />;
  if (!summary.data) return <LoadingState label="Looking for demo data…" />;
  if (!summary.data.present) {
    return <EmptyState page title="No demo data here" hint="This instance holds no demo network, windows or demo accounts." />;
  }
  return (
    <PageColumn narrow>
      <DemoDataPanel
        summary={summary.data}
        removing={removal.isPending}
        error={removal.isError ? removal.error.message : null}
        onRemove={() => removal.mutate()}
      />
    </PageColumn>
  );
}
