// The signed-in user's own sessions: list them, end one, end all ("sign out everywhere").
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { revokeAllSessionsResponseSchema, sessionListSchema } from '@/shared/sessions';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

const ROOT = ['my-sessions'] as const;

/** Key of the signed-in user's session list; invalidate it after ending a session. */
export const mySessionsKey = () => [...ROOT, 'list'] as const;

export function useMySessionsQuery() {
  return useQuery({ queryKey: mySessionsKey(), queryFn: () => apiFetch('/api/me/sessions', sessionListSchema) });
}

// Ending a session answers 204 with no body.
const noBodySchema = z.unknown();

export function useEndSessionMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (id: string) => apiFetch(`/api/me/sessions/${encodeURIComponent(id)}`, noBodySchema, jsonBody('DELETE')),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: mySessionsKey() }),
  });
}

export function useSignOutEverywhereMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch('/api/me/sessions/revoke-all', revokeAllSessionsResponseSchema, jsonBody('POST')),
    // This session ended too: nothing cached for this user may outlive it (removeQueries keeps the mutation's callbacks).
    onSuccess: () => queryClient.removeQueries(),
  });
}
