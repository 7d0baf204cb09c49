// Impact review of a window: affected slices, network effects, the map, and the caution on critical slices.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useWindowQuery } from '@/hooks/queries/windows';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { ImpactReview } from '@/components/impact/impact-review';
import { detailHref } from '@/components/windows/form-page';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';

function WindowImpactScreen() {
  const timeZone = useViewerTimeZone();
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const me = useMeQuery();
  const window = useWindowQuery(id);
  usePageTitle(titleWithName('Impact', window.data?.title));
  if (window.isError && !window.data) return <ErrorState message={window.error.message} onRetry={() => void window.refetch()} />;
  if (!window.data || !me.data) return <LoadingState label="Loading the window…" />;
  return <ImpactReview window={window.data} me={me.data} timeZone={timeZone} onOpenWindow={() => router.push(detailHref({ id }))} />;
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(WindowImpactScreen);
