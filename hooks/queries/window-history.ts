// A window's history (staff only): dated events with names and comments, under the window's key so every change
// to the window (which writes an event) refreshes it with the rest.
import { useQuery } from '@tanstack/react-query';
import { windowHistorySchema } from '@/shared/window-history';
import { apiFetch } from '@/hooks/api-fetch';
import { windowKey } from '@/hooks/queries/windows';

export const windowHistoryKey = (id: string) => [...windowKey(id), 'history'] as const;

/** `enabled` false for tenants, who are never shown the history (the server answers 404 to them). */
export function useWindowHistoryQuery(id: string, enabled = true) {
  return useQuery({
    queryKey: windowHistoryKey(id),
    enabled,
    queryFn: () => apiFetch(`/api/windows/${encodeURIComponent(id)}/history`, windowHistorySchema),
  });
}
