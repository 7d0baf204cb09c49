// The signed-in user's calendar subscription address: read it (made on first request) and replace it.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { calendarFeedSchema, type CalendarFeed } from '@/shared/calendar-feeds';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

const ROOT = ['calendar-feed'] as const;

/** Key of the signed-in user's feed address. */
export const calendarFeedKey = () => [...ROOT, 'mine'] as const;

// Revoking answers 204 with no body.
const noBodySchema = z.unknown();

/** `enabled` false for users whose roles read no windows (the API refuses them). */
export function useCalendarFeedQuery(enabled = true) {
  return useQuery({ queryKey: calendarFeedKey(), queryFn: () => apiFetch('/api/me/calendar-feed', calendarFeedSchema), enabled });
}

/** Ends the current address, then asks for the new one (the GET after a revoke makes it). */
export function useReplaceCalendarFeedMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (): Promise<CalendarFeed> => {
      await apiFetch('/api/me/calendar-feed', noBodySchema, jsonBody('DELETE'));
      return apiFetch('/api/me/calendar-feed', calendarFeedSchema);
    },
    onSuccess: (feed) => queryClient.setQueryData<CalendarFeed>(calendarFeedKey(), feed),
    // The old address is gone even when the new one could not be read: reload rather than show a dead address.
    onError: () => void queryClient.invalidateQueries({ queryKey: calendarFeedKey() }),
  });
}
