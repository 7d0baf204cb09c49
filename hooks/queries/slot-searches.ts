// Slot searches: start one (POST /api/slot-searches) and follow it (GET, polled while it is queued or running).
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { createdIdSchema, slotSearchSchema, type SearchStatus, type SlotSearchCreate } from '@/shared/slots';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

/** How often a search still computing is asked for again: the progress bar should move about twice a second. */
export const SLOT_POLL_INTERVAL_MS = 500;

const SLOT_SEARCHES_ROOT = ['slot-searches'] as const;
export const slotSearchKey = (id: string) => [...SLOT_SEARCHES_ROOT, id] as const;

/** A search or campaign still computing: its figures change, so it is polled. */
export function isSearchActive(status: SearchStatus | string): boolean {
  return status === 'queued' || status === 'running';
}

/** `id` null while no search has been started: nothing is asked. */
export function useSlotSearchQuery(id: string | null) {
  return useQuery({
    queryKey: slotSearchKey(id ?? ''),
    enabled: id !== null,
    queryFn: () => apiFetch(`/api/slot-searches/${encodeURIComponent(id ?? '')}`, slotSearchSchema),
    refetchInterval: (query) => {
      const status = query.state.data?.status;
      return status && isSearchActive(status) ? SLOT_POLL_INTERVAL_MS : false;
    },
    // A search left running in a background tab still finishes: the list should be there on return.
    refetchIntervalInBackground: true,
  });
}

export function useSlotSearchCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SlotSearchCreate) => apiFetch('/api/slot-searches', createdIdSchema, jsonBody('POST', input)),
    onSuccess: ({ id }) => void queryClient.invalidateQueries({ queryKey: slotSearchKey(id) }),
  });
}
