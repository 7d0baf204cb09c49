// Demo data (admin): what removing it would take, and the removal.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { DEMO_REMOVAL_CONFIRMATION, demoDataSummarySchema, demoRemovalResultSchema } from '@/shared/demo-data';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

const DEMO_DATA_ROOT = ['demo-data'] as const;

export const demoDataKey = () => [...DEMO_DATA_ROOT, 'summary'] as const;

export function useDemoDataQuery({ enabled = true }: { enabled?: boolean } = {}) {
  return useQuery({ queryKey: demoDataKey(), queryFn: () => apiFetch('/api/demo-data', demoDataSummarySchema), enabled });
}

export function useDemoRemovalMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch('/api/demo-data', demoRemovalResultSchema, jsonBody('DELETE', { confirm: DEMO_REMOVAL_CONFIRMATION })),
    // Sites, slices, windows, notices and the user list all changed: every cached answer is stale.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
