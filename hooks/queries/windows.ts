// One maintenance window: read it, its impact and conflicts; book, edit, assess, move it through its lifecycle.
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import {
  windowMutationSchema, windowSchema, type WindowCreate, type WindowPatch, type WindowTransition,
} from '@/shared/windows';
import { windowConflictsSchema, windowImpactSchema } from '@/shared/window-impact';
import { POLICY_DEFAULTS, policiesResponseSchema } from '@/shared/policies';
import { apiFetch, isApiError, jsonBody } from '@/hooks/api-fetch';
import { overviewKey } from '@/hooks/queries/overview';
import { windowsKey } from '@/hooks/queries/windows-list';

/** Key of one window and everything read about it; under the calendar's windowsKey() root, so a list
 * invalidation (freeze change, another booking) reaches open details too. */
export const windowKey = (id: string) => [...windowsKey(), 'detail', id] as const;
export const windowImpactKey = (id: string) => [...windowKey(id), 'impact'] as const;
export const windowConflictsKey = (id: string) => [...windowKey(id), 'conflicts'] as const;
const policiesKey = () => ['policies'] as const;

const windowPath = (id: string) => `/api/windows/${encodeURIComponent(id)}`;

export function useWindowQuery(id: string) {
  return useQuery({ queryKey: windowKey(id), queryFn: () => apiFetch(windowPath(id), windowSchema) });
}

/** The stored impact; a 404 means none has been computed for this version yet (the screen offers Assess). */
export function useWindowImpactQuery(id: string) {
  return useQuery({ queryKey: windowImpactKey(id), queryFn: () => apiFetch(`${windowPath(id)}/impact`, windowImpactSchema) });
}

export function useWindowConflictsQuery(id: string) {
  return useQuery({ queryKey: windowConflictsKey(id), queryFn: () => apiFetch(`${windowPath(id)}/conflicts`, windowConflictsSchema) });
}

/** Booking limits set by admins; the defaults stand in when the policies cannot be read, the server checks anyway. */
export function useBookingPolicies() {
  const query = useQuery({
    queryKey: policiesKey(),
    queryFn: () => apiFetch('/api/policies', policiesResponseSchema),
    // Policies change rarely; a booking session should not refetch them on every focus.
    staleTime: 10 * 60_000,
  });
  return query.data?.policies ?? POLICY_DEFAULTS;
}

function invalidateWindowViews(queryClient: QueryClient) {
  // Other windows' conflicts and the calendar change with this one, so everything under the root refetches.
  void queryClient.invalidateQueries({ queryKey: windowsKey() });
  void queryClient.invalidateQueries({ queryKey: overviewKey() });
}

export function useWindowCreateMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    // The key makes a retried or doubled submit of one booking book one window (the server answers with it again).
    mutationFn: ({ input, idempotencyKey }: { input: WindowCreate; idempotencyKey: string }) =>
      apiFetch('/api/windows', windowMutationSchema, { ...jsonBody('POST', input), headers: { 'Idempotency-Key': idempotencyKey } }),
    onSuccess: ({ window }) => {
      queryClient.setQueryData(windowKey(window.id), window);
      invalidateWindowViews(queryClient);
    },
  });
}

export function useWindowPatchMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: WindowPatch) => apiFetch(windowPath(id), windowMutationSchema, jsonBody('PATCH', input)),
    onSuccess: () => invalidateWindowViews(queryClient),
  });
}

/** Computes and stores the impact for `version` (a stale version is refused), which moves the window to assessed. */
export function useWindowAssessMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (version: number) =>
      apiFetch(`${windowPath(id)}/assess`, windowImpactSchema, jsonBody('POST', { version })),
    onSuccess: (impact) => {
      queryClient.setQueryData(windowImpactKey(id), impact);
      invalidateWindowViews(queryClient);
    },
  });
}

export function useWindowTransitionMutation(id: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: WindowTransition) =>
      apiFetch(`${windowPath(id)}/transition`, windowMutationSchema, jsonBody('POST', input)),
    onSuccess: () => invalidateWindowViews(queryClient),
  });
}

/** True for the 404 the impact route gives while no impact is stored for the window. */
export function isNoImpactYet(error: unknown): boolean {
  return isApiError(error) && error.status === 404 && error.code === 'IMPACT_NOT_FOUND';
}


export type MopUpload = { name: string; mime: string; uri: string; blob?: Blob };

function mopFormData(file: MopUpload): FormData {
  const form = new FormData();
  // Web pickers hand over a File; native ones a uri that React Native's FormData reads itself.
  if (file.blob) form.append('file', file.blob, file.name);
  else form.append('file', { uri: file.uri, name: file.name, type: file.mime } as unknown as Blob);
  return form;
}

// The upload reply describes the stored file; the window is re-read for it, so any JSON will do.
const mopReplySchema = z.unknown();

/** Stores (or replaces) the window's method-of-procedure document, sent as multipart field "file". */
export function useWindowMopUploadMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, file }: { id: string; file: MopUpload }) =>
      apiFetch(`${windowPath(id)}/mop`, mopReplySchema, { method: 'PUT', body: mopFormData(file) }),
    onSuccess: (_reply, { id }) => void queryClient.invalidateQueries({ queryKey: windowKey(id) }),
  });
}

/** Where the browser downloads the MOP from (same origin, session cookie). */
export function windowMopUrl(id: string): string {
  return `${windowPath(id)}/mop`;
}
