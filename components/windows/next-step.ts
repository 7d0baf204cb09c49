// The one next step on a window, by its state, its move plans and the viewer's roles (DESIGN §3): what it is,
// why it comes next, and what its button does — or no button when someone else takes it.
import type { RoleName } from '@/shared/api';
import type { PlanListItem } from '@/shared/plans';
import {
  canBookWindows, canReadPlans, canRunPlans, canSignOff, canSubmitForSignoff, isOperator,
} from '@/shared/permissions';
import type { Window, WindowStatus } from '@/shared/windows';

export type NextStepAction =
  | { kind: 'assess' }
  | { kind: 'open-plans' }
  | { kind: 'open-plan'; planId: string }
  | { kind: 'submit' }
  | { kind: 'open-signoff' }
  | { kind: 'transition'; to: Extract<WindowStatus, 'underway' | 'done'> };

export type NextStep = {
  /** the step, named for what happens next ("Assess impact") */
  label: string;
  /** one line: why this is the next step, or who takes it when the viewer cannot */
  why: string;
  /** what the button does; null when the viewer may not take this step (the bar shows no button) */
  action: NextStepAction | null;
};

type Roles = readonly RoleName[];
type WindowFacts = Pick<Window, 'status'>;

/** The newest run first; the list from the API is newest first already, but the rule should not depend on it. */
function newestFirst(plans: readonly PlanListItem[]): PlanListItem[] {
  return [...plans].sort((a, b) => Date.parse(b.createdAt) - Date.parse(a.createdAt));
}

function stepWhenAssessed(roles: Roles, plans: readonly PlanListItem[] | null): NextStep {
  const runner = canRunPlans(roles);
  const current = newestFirst(plans ?? []).filter((p) => !p.stale);
  const running = current.find((p) => p.status === 'queued' || p.status === 'running');
  if (running && canReadPlans(roles)) {
    return { label: 'Follow the run', why: 'The re-mapper is still working out where the affected slices can go.', action: { kind: 'open-plan', planId: running.id } };
  }
  const finished = current.find((p) => p.status === 'done' && !p.accepted);
  if (finished) {
    return runner
      ? { label: 'Review and accept', why: 'A run has finished: check where the slices move, then accept it as the plan.', action: { kind: 'open-plan', planId: finished.id } }
      : { label: 'Review and accept', why: 'A run has finished; a planner reviews it and accepts it as the plan.', action: null };
  }
  return runner
    ? { label: 'Plan the moves', why: 'The impact is known: work out where the affected slices move during the window.', action: { kind: 'open-plans' } }
    : { label: 'Plan the moves', why: 'The impact is known; a planner works out where the affected slices move.', action: null };
}

function stepWhenDraft(roles: Roles): NextStep {
  return canBookWindows(roles)
    ? { label: 'Assess impact', why: 'Nothing can be planned until we know which slices this work touches.', action: { kind: 'assess' } }
    : { label: 'Assess impact', why: 'Someone who books windows works out which slices this work touches.', action: null };
}

function stepWhenPlanned(roles: Roles): NextStep {
  return canSubmitForSignoff(roles)
    ? { label: 'Submit for sign-off', why: 'A plan is accepted: the change board signs it off before tenants are told.', action: { kind: 'submit' } }
    : { label: 'Submit for sign-off', why: 'A plan is accepted; a planner sends it to the change board.', action: null };
}

function stepWhenReturned(roles: Roles): NextStep {
  return canRunPlans(roles)
    ? { label: 'Revise the plan', why: 'The change board sent the plan back: read their comments, run again and accept a new plan.', action: { kind: 'open-plans' } }
    : { label: 'Revise the plan', why: 'The change board sent the plan back; a planner revises it.', action: null };
}

function stepWhenInReview(roles: Roles): NextStep {
  return canSignOff(roles)
    ? { label: 'Decide', why: 'The plan waits for the change board: approve it or send it back with a comment.', action: { kind: 'open-signoff' } }
    : { label: 'Sign-off', why: 'Waiting for the change board to approve the plan or send it back.', action: null };
}

function stepWhenWorkIsDue(roles: Roles, status: 'notified' | 'underway'): NextStep {
  const books = canBookWindows(roles);
  if (status === 'notified') {
    return { label: 'Start the work', why: 'Tenants have been told; mark the work started when it begins at the booked time.', action: books ? { kind: 'transition', to: 'underway' } : null };
  }
  return { label: 'Mark the work finished', why: 'The work is underway; mark it finished when the equipment is back in service.', action: books ? { kind: 'transition', to: 'done' } : null };
}

/**
 * The next step for this viewer, or null when there is none (tenants, and finished or withdrawn windows).
 * `plans` is the window's runs, or null when the viewer may not read them or they have not loaded.
 */
export function nextStep(roles: Roles, window: WindowFacts, plans: readonly PlanListItem[] | null): NextStep | null {
  if (!isOperator(roles)) return null;
  switch (window.status) {
    case 'draft': return stepWhenDraft(roles);
    case 'assessed': return stepWhenAssessed(roles, plans);
    case 'planned': return stepWhenPlanned(roles);
    case 'returned': return stepWhenReturned(roles);
    case 'in-review': return stepWhenInReview(roles);
    // Signing off issues the notices at once, so a window rests here only while they are being sent.
    case 'cleared': return { label: 'Tell the tenants', why: 'Signed off: the notices to the affected tenants are being sent.', action: null };
    case 'notified':
    case 'underway': return stepWhenWorkIsDue(roles, window.status);
    case 'done':
    case 'rolled-back':
    case 'withdrawn': return null;
  }
}
