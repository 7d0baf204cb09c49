// Sign-off: the approver's queue, one window's summary, decisions, submitting (planner), one-time-code enrolment
// and the sign-off policies (admin).
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { policiesResponseSchema, type PoliciesPatch } from '@/shared/policies';
import {
  otpEnrolmentSchema, otpStatusSchema, signoffDecisionResultSchema, signoffQueueSchema, signoffSubmitResultSchema,
  signoffSummarySchema, type SignoffDecisionBody,
} from '@/shared/signoff';
import { decidedByMeSchema, signoffWaitingCountSchema } from '@/shared/signoff-mine';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';
import { overviewKey } from '@/hooks/queries/overview';
import { windowsKey } from '@/hooks/queries/windows-list';

const ROOT = ['signoff'] as const;
export const signoffQueueKey = () => [...ROOT, 'queue'] as const;
export const signoffSummaryKey = (windowId: string) => [...ROOT, 'summary', windowId] as const;
export const otpStatusKey = () => [...ROOT, 'otp'] as const;
export const signoffWaitingKey = () => [...ROOT, 'waiting-count'] as const;
export const decidedByMeKey = () => [...ROOT, 'decided-by-me'] as const;
export const signoffPoliciesKey = () => ['policies'] as const;

const summaryPath = (windowId: string) => `/api/signoff/${encodeURIComponent(windowId)}`;

export function useSignoffQueueQuery(enabled = true) {
  // Other approvers decide meanwhile; a phone coming back to the queue should show the counts as they are now.
  return useQuery({ queryKey: signoffQueueKey(), queryFn: () => apiFetch('/api/signoff/queue', signoffQueueSchema), enabled, refetchOnWindowFocus: true });
}

/** Planners submit windows from elsewhere; a badge a minute behind is soon enough and costs one counting query. */
const WAITING_REFRESH_MS = 60_000;

export function useSignoffWaitingCountQuery(enabled = true) {
  return useQuery({
    queryKey: signoffWaitingKey(), queryFn: () => apiFetch('/api/signoff/waiting-count', signoffWaitingCountSchema),
    enabled, refetchOnWindowFocus: true, refetchInterval: enabled ? WAITING_REFRESH_MS : false,
  });
}

export function useDecidedByMeQuery(enabled = true) {
  return useQuery({ queryKey: decidedByMeKey(), queryFn: () => apiFetch('/api/signoff/decided-by-me', decidedByMeSchema), enabled });
}

export function useSignoffSummaryQuery(windowId: string) {
  return useQuery({ queryKey: signoffSummaryKey(windowId), queryFn: () => apiFetch(summaryPath(windowId), signoffSummarySchema) });
}

function invalidateAfterDecision(queryClient: QueryClient) {
  // The window's state (and the calendar and overview with it) can change with a decision or a submission.
  void queryClient.invalidateQueries({ queryKey: ROOT });
  void queryClient.invalidateQueries({ queryKey: windowsKey() });
  void queryClient.invalidateQueries({ queryKey: overviewKey() });
}

export function useSignoffDecisionMutation(windowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: SignoffDecisionBody) =>
      apiFetch(`${summaryPath(windowId)}/decision`, signoffDecisionResultSchema, jsonBody('POST', body)),
    onSuccess: () => invalidateAfterDecision(queryClient),
  });
}

export function useSubmitForSignoffMutation(windowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`/api/windows/${encodeURIComponent(windowId)}/submit`, signoffSubmitResultSchema, jsonBody('POST', {})),
    onSuccess: () => invalidateAfterDecision(queryClient),
  });
}

export function useOtpStatusQuery() {
  return useQuery({ queryKey: otpStatusKey(), queryFn: () => apiFetch('/api/me/otp', otpStatusSchema) });
}

export function useOtpEnrolMutation() {
  return useMutation({ mutationFn: () => apiFetch('/api/me/otp/enrol', otpEnrolmentSchema, jsonBody('POST')) });
}

export function useOtpConfirmMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (code: string) => apiFetch('/api/me/otp/confirm', otpStatusSchema, jsonBody('POST', { code })),
    onSuccess: (status) => queryClient.setQueryData(otpStatusKey(), status),
  });
}

// DELETE answers 204 with no body.
const noBodySchema = z.unknown();

export function useOtpRemoveMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (code: string) => apiFetch('/api/me/otp', noBodySchema, jsonBody('DELETE', { code })),
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: otpStatusKey() }),
  });
}

export function useSignoffPoliciesQuery(enabled = true) {
  return useQuery({ queryKey: signoffPoliciesKey(), queryFn: () => apiFetch('/api/policies', policiesResponseSchema), enabled });
}

export function useSignoffPoliciesMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (patch: PoliciesPatch) => apiFetch('/api/policies', policiesResponseSchema, jsonBody('PATCH', patch)),
    onSuccess: (reply) => {
      queryClient.setQueryData(signoffPoliciesKey(), reply);
      void queryClient.invalidateQueries({ queryKey: ROOT });
    },
  });
}
