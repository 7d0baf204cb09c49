// Freezes: periods in which no window may be booked (GET /api/freezes); admins add, change and delete them.
import { useMeQuery } from '@/hooks/queries/me';
import { useFreezesQuery } from '@/hooks/queries/freezes';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { FreezesView } from '@/components/freezes/freezes-view';
import { useFreezeEditor } from '@/components/freezes/use-freeze-editor';
import { canAdminister, isOperator } from '@/shared/permissions';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { usePageTitle } from '@/components/page-title';

export default function FreezesScreen() {
  const roles = useMeQuery().data?.roles ?? [];
  const freezes = useFreezesQuery(isOperator(roles));
  const editor = useFreezeEditor();
  const canEdit = canAdminister(roles);
  const timeZone = useViewerTimeZone();
  usePageTitle('Freezes');

  if (!isOperator(roles)) return <EmptyState page title="Freezes are for operator staff" hint="Your planned-work notices list what affects you." />;

  if (freezes.isError) return <ErrorState message={freezes.error.message} onRetry={() => void freezes.refetch()} />;
  if (!freezes.data) return <LoadingState label="Loading freezes…" />;
  if (freezes.data.freezes.length === 0 && !canEdit) {
    return <EmptyState page title="No freezes" hint="Windows may be booked on any day. Admins set freezes for holidays and big events." />;
  }
  return <FreezesView freezes={freezes.data.freezes} timeZone={timeZone} canEdit={canEdit} editor={editor} />;
}
