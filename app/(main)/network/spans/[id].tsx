// One span, from GET /api/spans/:id.
import { useLocalSearchParams } from 'expo-router';
import { useSpanQuery } from '@/hooks/queries/spans';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { SpanDetailView } from '@/components/inventory/span-detail-view';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function SpanScreen() {
  const { id = '' } = useLocalSearchParams<{ id: string }>();
  const span = useSpanQuery(id);
  usePageTitle(titleWithName('Span', span.data ? `${span.data.span.aName} – ${span.data.span.bName}` : null));
  if (span.isError) return <ErrorState message={span.error.message} onRetry={() => void span.refetch()} />;
  if (!span.data) return <LoadingState label="Loading the span…" />;
  return <SpanDetailView detail={span.data} />;
}
