// One site, from GET /api/sites/:id.
import { useLocalSearchParams } from 'expo-router';
import { useSiteQuery } from '@/hooks/queries/sites';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { SiteDetailView } from '@/components/inventory/site-detail-view';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function SiteScreen() {
  const { id = '' } = useLocalSearchParams<{ id: string }>();
  const site = useSiteQuery(id);
  usePageTitle(titleWithName('Site', site.data?.site.name));
  if (site.isError) return <ErrorState message={site.error.message} onRetry={() => void site.refetch()} />;
  if (!site.data) return <LoadingState label="Loading the site…" />;
  return <SiteDetailView detail={site.data} />;
}
