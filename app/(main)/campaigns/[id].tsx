// One campaign (planners; admins read): follow its run, then adjust, book or discard the draft.
import { useLocalSearchParams, useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useCampaignQuery } from '@/hooks/queries/campaigns';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { canPlanCampaigns, canReadCampaigns } from '@/shared/permissions';
import { CampaignPage } from '@/components/campaigns/campaign-page';
import { FormPage } from '@/components/windows/form-page';
import { titleWithName, usePageTitle } from '@/components/page-title';

export default function CampaignScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const timeZone = useViewerTimeZone();
  const me = useMeQuery();
  const campaign = useCampaignQuery(id);
  usePageTitle(titleWithName('Campaign', campaign.data?.title));
  if (me.isError) return <ErrorState message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <LoadingState />;
  if (!canReadCampaigns(me.data.roles)) return <ErrorState message="Campaigns are for planners; your roles do not include them." />;
  if (campaign.isError && !campaign.data) return <ErrorState message={campaign.error.message} onRetry={() => void campaign.refetch()} />;
  if (!campaign.data) return <LoadingState label="Loading the campaign…" />;
  return (
    <FormPage title={`Campaign: ${campaign.data.title}`}>
      <CampaignPage
        campaign={campaign.data}
        timeZone={timeZone}
        canEdit={canPlanCampaigns(me.data.roles)}
        onShowCalendar={(day) => router.push({ pathname: '/calendar', params: day ? { day, campaign: id } : { campaign: id } })}
        onOpenWindow={(windowId) => router.push({ pathname: '/windows/[id]', params: { id: windowId } })}
      />
    </FormPage>
  );
}
