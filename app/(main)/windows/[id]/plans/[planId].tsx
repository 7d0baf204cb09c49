// One run of the re-mapper: progress while it computes (polled), then the review, accept, or adjust and re-run.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { usePlanQuery } from '@/hooks/queries/plans';
import { useWindowQuery } from '@/hooks/queries/windows';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { PlanDetailView } from '@/components/plans/plan-detail-view';
import { WindowNextStep } from '@/components/windows/window-next-step';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';

function PlanScreen() {
  const timeZone = useViewerTimeZone();
  const { id, planId } = useLocalSearchParams<{ id: string; planId: string }>();
  const router = useRouter();
  const me = useMeQuery();
  const window = useWindowQuery(id);
  const plan = usePlanQuery(planId);
  usePageTitle(titleWithName('Move plan', window.data?.title));
  if (plan.isError && !plan.data) return <ErrorState message={plan.error.message} onRetry={() => void plan.refetch()} />;
  if (!plan.data || !me.data) return <LoadingState label="Loading the run…" />;
  const runs = `/windows/${encodeURIComponent(id)}/plans`;
  return (
    <PlanDetailView
      plan={plan.data.plan}
      windowTitle={window.data?.title ?? id}
      me={me.data}
      timeZone={timeZone}
      onOpenRuns={() => router.push(runs)}
      onAdjust={() => router.push(`${runs}?from=${encodeURIComponent(planId)}`)}
      onReschedule={() => router.push(`/windows/${encodeURIComponent(id)}/edit`)}
      onAddCapacity={(where) => router.push(where === 'imports' ? '/imports' : '/network')}
      next={window.data ? <WindowNextStep window={window.data} me={me.data} here={{ screen: 'plan', planId }} /> : null}
    />
  );
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(PlanScreen);
