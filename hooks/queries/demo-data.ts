// Demo data (admin): what removing it would take, and the removal.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { DEMO_REMOVAL_CONFIRMATION, demoDataSummarySchema, demoRemovalResultSchema } from '@/shared/demo-data';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

const DEMO_DATA_ROOT = ['demo-data'] as const;

export const demoDataKey = () => [...DEMO_DATA_ROOT, 'summary'] as const;

/**
 * The notice on Overview and Imports only asks "is the demo still here?", which changes once (on removal, which
 * invalidates every query), so it may keep its answer for a while instead of re-reading the counts on every visit.
 */
export const DEMO_NOTICE_STALE_MS = 5 * 60_000;

export function useDemoDataQuery({ enabled = true, staleTime }: { enabled?: boolean; staleTime?: number } = {}) {
  return useQuery({
    queryKey: demoDataKey(), queryFn: () => apiFetch('/api/demo-data', demoDataSummarySchema), enabled,
    ...(staleTime === undefined ? {} : { staleTime }),
  });
}

export function useDemoRemovalMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch('/api/demo-data', demoRemovalResultSchema, jsonBody('DELETE', { confirm: DEMO_REMOVAL_CONFIRMATION })),
    // Sites, slices, windows, notices and the user list all changed: every cached answer is stale.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
