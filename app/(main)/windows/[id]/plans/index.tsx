// A window's move plans: earlier runs for comparison and, for planners, a new run (pre-filled with ?from=<planId>).
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useWindowPlansQuery } from '@/hooks/queries/plans';
import { useWindowQuery } from '@/hooks/queries/windows';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { PlansView } from '@/components/plans/plans-view';
import { detailHref } from '@/components/windows/form-page';
import { WindowNextStep } from '@/components/windows/window-next-step';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';

function WindowPlansScreen() {
  const timeZone = useViewerTimeZone();
  const { id, from } = useLocalSearchParams<{ id: string; from?: string }>();
  const router = useRouter();
  const me = useMeQuery();
  const window = useWindowQuery(id);
  const plans = useWindowPlansQuery(id);
  usePageTitle(titleWithName('Move plans', window.data?.title));
  const failed = (window.isError && !window.data) ? window : (plans.isError && !plans.data) ? plans : null;
  if (failed?.error) return <ErrorState message={failed.error.message} onRetry={() => void failed.refetch()} />;
  if (!window.data || !me.data || !plans.data) return <LoadingState label="Loading the move plans…" />;
  return (
    <PlansView
      key={from ?? 'new'}
      window={window.data}
      me={me.data}
      plans={plans.data.plans}
      timeZone={timeZone}
      adjustFrom={plans.data.plans.find((p) => p.id === from)?.settings}
      onOpenPlan={(planId) => router.push(`/windows/${encodeURIComponent(id)}/plans/${encodeURIComponent(planId)}`)}
      onOpenWindow={() => router.push(detailHref({ id }))}
      next={<WindowNextStep window={window.data} me={me.data} here={{ screen: 'plans' }} />}
    />
  );
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(WindowPlansScreen);
