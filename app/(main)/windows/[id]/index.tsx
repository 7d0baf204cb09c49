// One window: times, state, equipment, MOP, conflicts and the actions the viewer may take.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useWindowQuery } from '@/hooks/queries/windows';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { detailHref, flashFromParams } from '@/components/windows/form-page';
import { WindowDetail } from '@/components/windows/window-detail';
import { WindowPlansEntry } from '@/components/plans/window-plans-entry';
import { SubmitForSignoff } from '@/components/signoff/submit-for-signoff';
import { WindowTenantNotices } from '@/components/notices/window-tenant-notices';
import { PackLink } from '@/components/pack/pack-link';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';

function WindowScreen() {
  const timeZone = useViewerTimeZone();
  const params = useLocalSearchParams<{ id: string; saved?: string; reverted?: string; mop?: string }>();
  const router = useRouter();
  const me = useMeQuery();
  const window = useWindowQuery(params.id);
  usePageTitle(titleWithName('Window', window.data?.title));
  if (window.isError && !window.data) return <ErrorState message={window.error.message} onRetry={() => void window.refetch()} />;
  if (!window.data || !me.data) return <LoadingState label="Loading the window…" />;
  return (
    <WindowDetail
      window={window.data}
      me={me.data}
      timeZone={timeZone}
      flash={flashFromParams(params)}
      onEdit={() => router.push(`/windows/${encodeURIComponent(params.id)}/edit`)}
      onOpenImpact={() => router.push(`/windows/${encodeURIComponent(params.id)}/impact`)}
      onOpenWindow={(id) => router.push(detailHref({ id }))}
      onReload={() => void window.refetch()}
    >
      <WindowPlansEntry
        windowId={params.id}
        me={me.data}
        onOpenPlans={() => router.push(`/windows/${encodeURIComponent(params.id)}/plans`)}
        onOpenPlan={(planId) => router.push(`/windows/${encodeURIComponent(params.id)}/plans/${encodeURIComponent(planId)}`)}
      />
      <SubmitForSignoff window={window.data} me={me.data} onOpenSignoff={() => router.push(`/sign-off/${encodeURIComponent(params.id)}`)} />
      <WindowTenantNotices windowId={params.id} me={me.data} timeZone={timeZone} />
      <PackLink me={me.data} onOpen={() => router.push(`/windows/${encodeURIComponent(params.id)}/pack`)} />
    </WindowDetail>
  );
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(WindowScreen);
