// Overview screen: headline figures and the next windows (a tenant's: its notified work), from GET /api/overview.
import { useRouter } from 'expo-router';
import { useOverviewQuery } from '@/hooks/queries/overview';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { isOverviewEmpty, OverviewView } from '@/components/overview/overview-view';
import { usePageTitle } from '@/components/page-title';

export default function OverviewScreen() {
  const router = useRouter();
  const overview = useOverviewQuery();
  usePageTitle('Overview');
  if (overview.isError) return <ErrorState message={overview.error.message} onRetry={() => void overview.refetch()} />;
  if (!overview.data) return <LoadingState label="Loading the overview…" />;
  if (isOverviewEmpty(overview.data)) {
    return <EmptyState page title="No network loaded yet" hint="Import a scenario to see sites, slices and windows here." />;
  }
  return <OverviewView overview={overview.data} onOpenNotice={(id) => router.push({ pathname: '/notices/[id]', params: { id } })} />;
}
