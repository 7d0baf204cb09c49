// The signed-in user: who am I, sign in, sign out, and the time zone they read times in.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { meSchema, signInResponseSchema, type Me, type SignInRequest } from '@/shared/api';
import type { TimeZoneUpdate } from '@/shared/time-zone';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

const ME_ROOT = ['me'] as const;

/** Key of the signed-in user's record; invalidate it when roles or the session change. */
export const meKey = () => [...ME_ROOT, 'current'] as const;

/** The signed-in user; fails with ApiError status 401 when there is no session. */
export function useMeQuery() {
  return useQuery({ queryKey: meKey(), queryFn: () => apiFetch('/api/me', meSchema) });
}

export function useSignInMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SignInRequest) =>
      apiFetch('/api/auth/sign-in', signInResponseSchema, jsonBody('POST', input)),
    onSuccess: ({ user }) => {
      // Nothing cached for a previous user may leak into this session.
      queryClient.removeQueries();
      queryClient.setQueryData<Me>(meKey(), user);
    },
  });
}

// The sign-out reply carries nothing the app needs; any JSON (or none) is fine.
const signOutReplySchema = z.unknown();

export function useSignOutMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch('/api/auth/sign-out', signOutReplySchema, jsonBody('POST')),
    // Drop every cached answer: the next user of this browser must not see this one's data.
    // removeQueries, not clear(): the mutation itself must survive to run its callers' onSuccess.
    onSuccess: () => queryClient.removeQueries(),
  });
}

/** Sets the signed-in user's zone (null = the network's zone); every screen re-reads it from the user record. */
export function useTimeZoneMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: TimeZoneUpdate) => apiFetch('/api/me/time-zone', meSchema, jsonBody('PATCH', input)),
    onSuccess: (user) => queryClient.setQueryData<Me>(meKey(), user),
  });
}
