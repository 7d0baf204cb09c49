// Single sign-on: the sign-in button's words (no session needed) and the admin's issuer settings.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { ssoButtonSchema, ssoSettingsSchema, type SsoSettings, type SsoSettingsUpdate } from '@/shared/sso';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

const SSO_ROOT = ['sso'] as const;

export const ssoButtonKey = () => [...SSO_ROOT, 'button'] as const;
export const ssoSettingsKey = () => [...SSO_ROOT, 'settings'] as const;

/** Where the browser goes to sign in through the issuer (a full page load, not a fetch). */
export const SSO_START_PATH = '/api/auth/sso/start';

export function useSsoButtonQuery() {
  return useQuery({
    queryKey: ssoButtonKey(),
    queryFn: () => apiFetch('/api/auth/sso/button', ssoButtonSchema),
    // Without the answer the screen still offers password sign-in; asking again and again helps no one.
    retry: false,
  });
}

export function useSsoSettingsQuery(enabled: boolean) {
  return useQuery({ queryKey: ssoSettingsKey(), queryFn: () => apiFetch('/api/sso', ssoSettingsSchema), enabled });
}

export function useSsoSettingsMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: SsoSettingsUpdate) => apiFetch('/api/sso', ssoSettingsSchema, jsonBody('PUT', input)),
    onSuccess: (saved: SsoSettings) => {
      queryClient.setQueryData(ssoSettingsKey(), saved);
      void queryClient.invalidateQueries({ queryKey: ssoButtonKey() });
    },
  });
}
