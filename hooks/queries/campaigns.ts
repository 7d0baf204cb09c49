// Campaigns: the list, one campaign (polled while it computes), create, move windows, book all and discard.
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import {
  campaignBookedSchema, campaignListSchema, campaignSchema, createdIdSchema,
  type CampaignCreate, type CampaignPatch,
} from '@/shared/slots';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { isSearchActive, SLOT_POLL_INTERVAL_MS } from '@/hooks/queries/slot-searches';
import { windowsKey } from '@/hooks/queries/windows-list';

const CAMPAIGNS_ROOT = ['campaigns'] as const;
export const campaignListKey = (params: CampaignListParams = {}) => [...CAMPAIGNS_ROOT, 'list', params] as const;
export const campaignKey = (id: string) => [...CAMPAIGNS_ROOT, 'detail', id] as const;

export type CampaignListParams = { status?: string; from?: string; to?: string };

const campaignPath = (id: string) => `/api/campaigns/${encodeURIComponent(id)}`;

function listPath(params: CampaignListParams): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) if (value) query.set(key, value);
  const text = query.toString();
  return `/api/campaigns${text ? `?${text}` : ''}`;
}

/** `enabled` false for viewers who may not read campaigns, so no refused request is made. */
export function useCampaignsQuery(params: CampaignListParams = {}, enabled = true) {
  return useQuery({
    queryKey: campaignListKey(params),
    enabled,
    queryFn: () => apiFetch(listPath(params), campaignListSchema),
    // The list shows each campaign's state; keep it moving while one computes.
    refetchInterval: (query) => (query.state.data?.campaigns.some((c) => isSearchActive(c.status)) ? SLOT_POLL_INTERVAL_MS * 4 : false),
  });
}

export function useCampaignQuery(id: string) {
  return useQuery({
    queryKey: campaignKey(id),
    queryFn: () => apiFetch(campaignPath(id), campaignSchema),
    refetchInterval: (query) => {
      const status = query.state.data?.status;
      return status && isSearchActive(status) ? SLOT_POLL_INTERVAL_MS : false;
    },
    refetchIntervalInBackground: true,
  });
}

function invalidateCampaigns(queryClient: QueryClient, id?: string) {
  void queryClient.invalidateQueries({ queryKey: [...CAMPAIGNS_ROOT, 'list'] });
  if (id) void queryClient.invalidateQueries({ queryKey: campaignKey(id) });
}

export function useCampaignCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CampaignCreate) => apiFetch('/api/campaigns', createdIdSchema, jsonBody('POST', input)),
    onSuccess: () => invalidateCampaigns(queryClient),
  });
}

/** Moves windows or renames; a refusal (CAMPAIGN_RULES, STALE_VERSION) refreshes the draft so the screen shows what is stored. */
export function useCampaignPatchMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: CampaignPatch) => apiFetch(campaignPath(id), campaignSchema, jsonBody('PATCH', patch)),
    onSuccess: (campaign) => {
      queryClient.setQueryData(campaignKey(id), campaign);
      invalidateCampaigns(queryClient);
    },
    onError: () => invalidateCampaigns(queryClient, id),
  });
}

export function useCampaignBookMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version: number) => apiFetch(`${campaignPath(id)}/book`, campaignBookedSchema, jsonBody('POST', { version })),
    onSuccess: ({ campaign }) => {
      queryClient.setQueryData(campaignKey(id), campaign);
      invalidateCampaigns(queryClient);
      // The booked windows appear on the calendar and the overview.
      void queryClient.invalidateQueries({ queryKey: windowsKey() });
    },
    onError: () => invalidateCampaigns(queryClient, id),
  });
}

export function useCampaignDiscardMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version: number) => apiFetch(campaignPath(id), campaignSchema, jsonBody('DELETE', { version })),
    onSuccess: (campaign) => {
      queryClient.setQueryData(campaignKey(id), campaign);
      invalidateCampaigns(queryClient);
    },
    onError: () => invalidateCampaigns(queryClient, id),
  });
}
