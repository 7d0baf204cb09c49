// Book a maintenance window (engineers, planners, admins); on success, open the new window's page.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { canBookWindows } from '@/shared/permissions';
import { useMeQuery } from '@/hooks/queries/me';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { BookWindow } from '@/components/windows/book-window';
import { detailHref, FormPage } from '@/components/windows/form-page';
import { usePageTitle } from '@/components/page-title';
import { staffWindowPage } from '@/components/notices/tenant-window-page';
import { FindSlotHint, PrefillNote } from '@/components/slots/prefill-note';
import { prefillFromParams } from '@/components/slots/slot-prefill';

function NewWindowScreen() {
  const timeZone = useViewerTimeZone();
  const router = useRouter();
  const me = useMeQuery();
  const params = useLocalSearchParams();
  // The form reads its starting values once, when it opens (after the viewer's zone is known), then owns them.
  const prefill = prefillFromParams(params, timeZone);
  usePageTitle('Book a window');
  if (me.isError) return <ErrorState message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <LoadingState />;
  if (!canBookWindows(me.data.roles)) return <ErrorState message="Your roles do not include booking windows." />;
  return (
    <FormPage title="Book a window">
      {prefill ? <PrefillNote /> : <FindSlotHint onPress={() => router.push('/slots')} />}
      <BookWindow
        me={me.data}
        timeZone={timeZone}
        initialValues={prefill ?? undefined}
        onSaved={(outcome) => router.replace(detailHref({ ...outcome, saved: 'booked' }))}
        onCancel={() => (router.canGoBack() ? router.back() : router.replace('/calendar'))}
      />
    </FormPage>
  );
}

// Tenant users get their own view of a window's address (see staffWindowPage).
export default staffWindowPage(NewWindowScreen);
