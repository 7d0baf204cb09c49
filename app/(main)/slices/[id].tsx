// One slice, from GET /api/slices/:id.
import { useLocalSearchParams } from 'expo-router';
import { useSliceQuery } from '@/hooks/queries/slices';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { SliceDetailView } from '@/components/inventory/slice-detail-view';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function SliceScreen() {
  const { id = '' } = useLocalSearchParams<{ id: string }>();
  const slice = useSliceQuery(id);
  usePageTitle(titleWithName('Slice', slice.data?.slice.name));
  if (slice.isError) return <ErrorState message={slice.error.message} onRetry={() => void slice.refetch()} />;
  if (!slice.data) return <LoadingState label="Loading the slice…" />;
  return <SliceDetailView detail={slice.data} />;
}
