// A new campaign (planners): the groups, the timing and the rules; on success, open its page to follow the run.
import { useState } from 'react';
import { useRouter } from 'expo-router';
import { useMeQuery } from '@/hooks/queries/me';
import { useCampaignCreateMutation } from '@/hooks/queries/campaigns';
import { ErrorState, LoadingState } from '@/components/screen-states';
import { canPlanCampaigns } from '@/shared/permissions';
import { CampaignForm } from '@/components/campaigns/campaign-form';
import { newGroup } from '@/components/campaigns/campaign-form-state';
import { defaultTiming } from '@/components/slots/timing-form-state';
import { FormPage } from '@/components/windows/form-page';
import { usePageTitle } from '@/components/page-title';

export default function NewCampaignScreen() {
  const router = useRouter();
  const me = useMeQuery();
  const create = useCampaignCreateMutation();
  const [initialValues] = useState(() => ({
    ...defaultTiming(Date.now()), title: '', groups: [newGroup()], maxPerNightText: '2', minDaysText: '7',
  }));
  usePageTitle('New campaign');
  if (me.isError) return <ErrorState message={me.error.message} onRetry={() => void me.refetch()} />;
  if (!me.data) return <LoadingState />;
  if (!canPlanCampaigns(me.data.roles)) return <ErrorState message="Campaigns are scheduled by planners; your roles do not include it." />;
  return (
    <FormPage title="New campaign">
      <CampaignForm
        initialValues={initialValues}
        submitting={create.isPending}
        submitError={create.error?.message ?? null}
        onSubmit={(request) => create.mutate(request, { onSuccess: ({ id }) => router.replace({ pathname: '/campaigns/[id]', params: { id } }) })}
        onCancel={() => (router.canGoBack() ? router.back() : router.replace('/campaigns'))}
      />
    </FormPage>
  );
}
