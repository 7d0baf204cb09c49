// People (admin): find, invite, change roles, deactivate and reactivate the people who use Slackwater.
import { useMeQuery } from '@/hooks/queries/me';
import { useTenantsQuery } from '@/hooks/queries/tenants';
import { canAdminister } from '@/shared/permissions';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { PageColumn } from '@/components/page-column';
import { usePageTitle } from '@/components/page-title';
import { PeopleView } from '@/components/people/people-view';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';

export default function PeopleScreen() {
  const me = useMeQuery();
  const tenants = useTenantsQuery();
  const timeZone = useViewerTimeZone();
  usePageTitle('People');
  if (me.data && !canAdminister(me.data.roles)) return <EmptyState page title="People is for admins" hint="Ask an admin to invite someone or change roles." />;
  if (tenants.isError) return <ErrorState message={tenants.error.message} onRetry={() => void tenants.refetch()} />;
  if (!me.data || !tenants.data) return <LoadingState label="Loading people…" />;
  return (
    <PageColumn>
      <PeopleView tenants={tenants.data.items} viewerZone={timeZone} myId={me.data.id} />
    </PageColumn>
  );
}
