// Find a slot (engineers, planners, admins): when does one window's work hurt least? The search runs as a job;
// its id stays in the address so a reload shows the same answer.
import { useLocalSearchParams, useRouter, type Href } from 'expo-router';
import { canSearchSlots } from '@/shared/permissions';
import { useMeQuery } from '@/hooks/queries/me';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { SlotFinder } from '@/components/slots/slot-finder';
import { FormPage } from '@/components/windows/form-page';
import { usePageTitle } from '@/components/page-title';

export default function SlotFinderScreen() {
  const timeZone = useViewerTimeZone();
  const router = useRouter();
  const me = useMeQuery();
  const params = useLocalSearchParams<{ search?: string }>();
  usePageTitle('Find a slot');
  if (me.isError) return <ErrorState message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <LoadingState />;
  if (!canSearchSlots(me.data.roles)) return <ErrorState message="Finding slots is for engineers, planners and admins; your roles do not include it." />;
  return (
    <FormPage title="Find a slot">
      <SlotFinder
        timeZone={timeZone}
        searchId={params.search ?? null}
        onSearchId={(id) => router.setParams({ search: id ?? undefined })}
        onOpen={(href) => router.push(href as Href)}
      />
    </FormPage>
  );
}
