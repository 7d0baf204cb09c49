// The first admin's set-up link: does it still work, and create the admin (which signs them in).
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { signInResponseSchema, type Me } from '@/shared/api';
import { setUpLinkStatusSchema, type SetUpRequest } from '@/shared/setup';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { meKey } from '@/hooks/queries/me';

const SETUP_ROOT = ['set-up'] as const;

export const setUpLinkKey = (token: string) => [...SETUP_ROOT, 'link', token] as const;

/** 200 while the link works; ApiError 404 SETUP_LINK_INVALID once used, expired or unknown. */
export function useSetUpLinkQuery(token: string) {
  return useQuery({
    queryKey: setUpLinkKey(token),
    queryFn: () => apiFetch(`/api/set-up/${encodeURIComponent(token)}`, setUpLinkStatusSchema),
    enabled: token !== '',
    // A 404 is the answer, not a hiccup: asking again would only count against the attempt limit.
    retry: false,
  });
}

export function useSetUpMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SetUpRequest) => apiFetch('/api/set-up', signInResponseSchema, jsonBody('POST', input)),
    onSuccess: ({ user }) => {
      queryClient.removeQueries();
      queryClient.setQueryData<Me>(meKey(), user);
    },
  });
}
