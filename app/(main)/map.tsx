// Map screen: the whole network (or a tenant's part of it) from GET /api/network/map.
import { useRouter } from 'expo-router';
import { useNetworkMapQuery } from '@/hooks/queries/network-map';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { MapScreenView } from '@/components/map/map-screen-view';
import { usePageTitle } from '@/components/page-title';

export default function MapScreen() {
  const map = useNetworkMapQuery();
  const router = useRouter();
  usePageTitle('Map');
  if (map.isError) return <ErrorState message={map.error.message} onRetry={() => void map.refetch()} />;
  if (!map.data) return <LoadingState label="Loading the map…" />;
  if (map.data.sites.length === 0) {
    return <EmptyState page title="No network to show yet" hint="Import a scenario or a topology to see its sites and spans here." />;
  }
  return (
    <MapScreenView
      data={map.data}
      onOpenSlice={(id) => router.push({ pathname: '/slices/[id]', params: { id } })}
      onOpenElement={({ kind, id }) =>
        router.push({ pathname: kind === 'site' ? '/network/sites/[id]' : '/network/spans/[id]', params: { id } })}
    />
  );
}
