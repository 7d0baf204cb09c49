// Edit a window against the version it was loaded at; a stale edit is refused with a reload offer.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useWindowQuery } from '@/hooks/queries/windows';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { EditWindow } from '@/components/windows/edit-window';
import { detailHref, FormPage } from '@/components/windows/form-page';
import { titleWithName, usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';

function EditWindowScreen() {
  const timeZone = useViewerTimeZone();
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const me = useMeQuery();
  const window = useWindowQuery(id);
  usePageTitle(titleWithName('Edit', window.data?.title));
  if (window.isError && !window.data) return <ErrorState message={window.error.message} onRetry={() => void window.refetch()} />;
  if (!window.data || !me.data) return <LoadingState label="Loading the window…" />;
  return (
    <FormPage title={`Edit: ${window.data.title}`}>
      <EditWindow
        window={window.data}
        me={me.data}
        timeZone={timeZone}
        onReload={() => window.refetch()}
        reloading={window.isFetching}
        onSaved={(outcome) => router.replace(detailHref({ ...outcome, saved: 'edited' }))}
        onCancel={() => router.replace(detailHref({ id }))}
      />
    </FormPage>
  );
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(EditWindowScreen);
