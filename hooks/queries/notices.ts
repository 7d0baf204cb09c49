// Tenant notices: the tenant portal's upcoming work, one notice and its acknowledgement; for staff, a window's
// notices with their sending state, resend after a failure and the admin's lead-time override.
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { noticeResponseSchema, portalWorkSchema, windowNoticesSchema } from '@/shared/notices';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { windowsKey } from '@/hooks/queries/windows-list';

const NOTICES_ROOT = ['notices'] as const;
// Sending happens in the background worker; while a notice waits to go out, look again now and then.
const SENDING_REFRESH_MS = 10_000;

/** Key of everything about notices; invalidate it after any change to one. */
export const noticesKey = () => [...NOTICES_ROOT] as const;
export const portalWorkKey = () => [...NOTICES_ROOT, 'portal'] as const;
export const noticeKey = (id: string) => [...NOTICES_ROOT, 'notice', id] as const;
export const windowNoticesKey = (windowId: string) => [...NOTICES_ROOT, 'window', windowId] as const;

/** Where the invitation (.ics) of a notice downloads from. */
export const noticeIcsPath = (id: string) => `/api/notices/${encodeURIComponent(id)}/ics`;
const noticePath = (id: string) => `/api/notices/${encodeURIComponent(id)}`;

export function usePortalWorkQuery() {
  return useQuery({ queryKey: portalWorkKey(), queryFn: () => apiFetch('/api/portal/work', portalWorkSchema) });
}

export function useNoticeQuery(id: string) {
  return useQuery({ queryKey: noticeKey(id), queryFn: () => apiFetch(noticePath(id), noticeResponseSchema), enabled: id !== '' });
}

export function useAcknowledgeNoticeMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`${noticePath(id)}/acknowledge`, noticeResponseSchema, jsonBody('POST', {})),
    onSuccess: (data) => {
      queryClient.setQueryData(noticeKey(id), data);
      void queryClient.invalidateQueries({ queryKey: portalWorkKey() });
    },
  });
}

export function useWindowNoticesQuery(windowId: string, enabled: boolean) {
  return useQuery({
    queryKey: windowNoticesKey(windowId),
    queryFn: () => apiFetch(`/api/windows/${encodeURIComponent(windowId)}/notices`, windowNoticesSchema),
    enabled,
    // Only queued notices change by themselves; sent, failed and held ones wait for a person (and a refetch on focus).
    refetchInterval: (query) => (query.state.data?.notices.some((n) => n.status === 'queued') ? SENDING_REFRESH_MS : false),
  });
}

/** Resend (admin, planner) or override the lead time (admin, with a reason); both may move the window on. */
export function useNoticeActionMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (a: { id: string; action: 'resend' } | { id: string; action: 'override'; reason: string }) =>
      apiFetch(`${noticePath(a.id)}/${a.action}`, noticeResponseSchema, jsonBody('POST', a.action === 'override' ? { reason: a.reason } : {})),
    onSuccess: () => {
      void queryClient.invalidateQueries({ queryKey: noticesKey() });
      void queryClient.invalidateQueries({ queryKey: windowsKey() });
    },
  });
}
