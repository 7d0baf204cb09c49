// Campaigns (planners; admins read): many windows scheduled together on the nights that hurt least.
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useCampaignsQuery } from '@/hooks/queries/campaigns';
import { Button } from '@/components/button';
import { EmptyState, ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { canPlanCampaigns, canReadCampaigns } from '@/shared/permissions';
import { CampaignList } from '@/components/campaigns/campaign-list';
import { FormPage } from '@/components/windows/form-page';
import { usePageTitle } from '@/components/page-title';

export default function CampaignsScreen() {
  const router = useRouter();
  const timeZone = useViewerTimeZone();
  const me = useMeQuery();
  const roles = me.data?.roles ?? [];
  const campaigns = useCampaignsQuery({}, canReadCampaigns(roles));
  usePageTitle('Campaigns');
  if (me.isError) return <ErrorState message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <LoadingState />;
  if (!canReadCampaigns(roles)) return <ErrorState message="Campaigns are for planners; your roles do not include them." />;
  if (campaigns.isError && !campaigns.data) return <ErrorState message={campaigns.error.message} onRetry={() => void campaigns.refetch()} />;
  if (!campaigns.data) return <LoadingState label="Loading the campaigns…" />;
  return (
    <FormPage title="Campaigns">
      {canPlanCampaigns(roles) ? <Button label="New campaign" onPress={() => router.push('/campaigns/new')} testID="campaign-new" /> : null}
      {campaigns.data.campaigns.length === 0 ? (
        <EmptyState title="No campaigns yet" hint="A campaign schedules a window for each group of sites or spans on the nights that hurt least, then books them all at once." />
      ) : (
        <CampaignList campaigns={campaigns.data.campaigns} timeZone={timeZone} onOpen={(id) => router.push({ pathname: '/campaigns/[id]', params: { id } })} />
      )}
    </FormPage>
  );
}
