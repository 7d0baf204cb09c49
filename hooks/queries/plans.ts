// Move plans of a window: the runs, one run (polled while it computes), and run / cancel / accept.
import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import {
  planListResponseSchema, planResponseSchema, type PlanAccept, type PlanRunStatus, type PlanSettingsInput,
} from '@/shared/plans';
import { apiFetch, jsonBody } from '@/hooks/api-fetch';

type PlanListResponse = ReturnType<typeof planListResponseSchema.parse>;
import { overviewKey } from '@/hooks/queries/overview';
import { windowKey } from '@/hooks/queries/windows';

/** How often a queued or running plan is asked for again: the progress bar should move about once a second. */
export const PLAN_POLL_INTERVAL_MS = 1_000;

const PLANS_ROOT = ['plans'] as const;

/** The runs of one window; under windowKey so a window edit (which makes runs stale) refreshes the list too. */
export const windowPlansKey = (windowId: string) => [...windowKey(windowId), 'plans'] as const;
/** One run by id (the review is large, so it is cached apart from the list). */
export const planKey = (planId: string) => [...PLANS_ROOT, 'detail', planId] as const;

const windowPlansPath = (windowId: string) => `/api/windows/${encodeURIComponent(windowId)}/plans`;
const planPath = (planId: string) => `/api/plans/${encodeURIComponent(planId)}`;

/** A run still computing: its figures change, so it is polled. */
export function isPlanActive(status: PlanRunStatus): boolean {
  return status === 'queued' || status === 'running';
}

/** `enabled` false for viewers who may not list runs (tenants), so no refused request is made. */
export function useWindowPlansQuery(windowId: string, enabled = true) {
  return useQuery({
    queryKey: windowPlansKey(windowId),
    enabled,
    queryFn: () => apiFetch(windowPlansPath(windowId), planListResponseSchema),
    // The list shows each run's state; keep it moving while any run computes, then stop asking.
    refetchInterval: (query) => (query.state.data?.plans.some((p) => isPlanActive(p.status)) ? PLAN_POLL_INTERVAL_MS : false),
  });
}

export function usePlanQuery(planId: string) {
  return useQuery({
    queryKey: planKey(planId),
    queryFn: () => apiFetch(planPath(planId), planResponseSchema),
    // Polled until the run is done, failed or cancelled, so the review appears without a manual refresh.
    refetchInterval: (query) => {
      const status = query.state.data?.plan.status;
      return status && isPlanActive(status) ? PLAN_POLL_INTERVAL_MS : false;
    },
    // A polled screen in a background tab still finishes: the result should be there on return.
    refetchIntervalInBackground: true,
  });
}

function invalidatePlanViews(queryClient: QueryClient, windowId: string, planId?: string) {
  // The window's status (planned) and its list of runs change; the overview counts windows by status.
  void queryClient.invalidateQueries({ queryKey: windowKey(windowId) });
  void queryClient.invalidateQueries({ queryKey: overviewKey() });
  if (planId) void queryClient.invalidateQueries({ queryKey: planKey(planId) });
}

/** Queues a run with these settings; the server answers 202 with the new (queued) plan. */
export function usePlanRunMutation(windowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (settings: PlanSettingsInput) => apiFetch(windowPlansPath(windowId), planResponseSchema, jsonBody('POST', settings)),
    onSuccess: ({ plan }) => {
      queryClient.setQueryData(planKey(plan.id), { plan });
      invalidatePlanViews(queryClient, windowId);
    },
  });
}

export function usePlanCancelMutation(windowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (planId: string) => apiFetch(`${planPath(planId)}/cancel`, planResponseSchema, jsonBody('POST')),
    onSettled: (_reply, _error, planId) => invalidatePlanViews(queryClient, windowId, planId),
  });
}

/**
 * Accepts a run as the window's plan; the server verifies it again and may refuse with the reason. Accepting
 * another run than the accepted one names the accepted run as listed on screen (`replacesPlanId`): if someone
 * accepted a different run meanwhile, the server refuses (PLAN_ALREADY_ACCEPTED) and the refreshed list shows it.
 */
export function usePlanAcceptMutation(windowId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ planId, body }: { planId: string; body: PlanAccept }) => {
      const listed = queryClient.getQueryData<PlanListResponse>(windowPlansKey(windowId))?.plans;
      const replacesPlanId = listed?.find((p) => p.accepted && p.id !== planId)?.id;
      const sent: PlanAccept = replacesPlanId ? { ...body, replacesPlanId } : body;
      return apiFetch(`${planPath(planId)}/accept`, planResponseSchema, jsonBody('POST', sent));
    },
    onSuccess: (_reply, { planId }) => invalidatePlanViews(queryClient, windowId, planId),
    // A refusal may mean the window's accepted run changed: the list shows the current one again.
    onError: () => void queryClient.invalidateQueries({ queryKey: windowPlansKey(windowId) }),
  });
}
