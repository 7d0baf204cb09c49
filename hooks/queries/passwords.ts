// Forgotten and changed passwords: ask for a reset link, check and use it, and change one's own password.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  changePasswordResponseSchema, forgotPasswordResponseSchema, resetLinkStatusSchema,
  type ChangePasswordRequest, type ForgotPasswordRequest, type ResetPasswordRequest,
} from '@/shared/passwords';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { mySessionsKey } from '@/hooks/queries/sessions';

const ROOT = ['passwords'] as const;

export const resetLinkKey = (token: string) => [...ROOT, 'reset-link', token] as const;

export function useForgotPasswordMutation() {
  return useMutation({
    mutationFn: (input: ForgotPasswordRequest) => apiFetch('/api/auth/forgot-password', forgotPasswordResponseSchema, jsonBody('POST', input)),
  });
}

/** 200 while the link works; ApiError 404 RESET_LINK_INVALID once used, expired or unknown. */
export function useResetLinkQuery(token: string) {
  return useQuery({
    queryKey: resetLinkKey(token),
    queryFn: () => apiFetch(`/api/auth/reset-password/${encodeURIComponent(token)}`, resetLinkStatusSchema),
    enabled: token !== '',
    // A 404 is the answer, not a hiccup: asking again would only count against the attempt limit.
    retry: false,
  });
}

export function useResetPasswordMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ResetPasswordRequest) => apiFetch('/api/auth/reset-password', z.unknown(), jsonBody('POST', input)),
    // Every session of the account ended: nothing cached belongs to anyone any more.
    onSuccess: () => queryClient.removeQueries(),
  });
}

export function useChangePasswordMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangePasswordRequest) => apiFetch('/api/me/password', changePasswordResponseSchema, jsonBody('POST', input)),
    // The other sessions ended: the session list must show only this one.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mySessionsKey() }),
  });
}
