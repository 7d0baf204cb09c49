// Domain errors of move plans; each with a fixed code and HTTP status (messages name what to do next).
import { AppError, domainError } from '../../errors';

export class PlanNotFoundError extends domainError('PLAN_NOT_FOUND', 404, (id: string) => `No move plan ${id}.`) {}

/** Pinned functions or excluded sites that do not exist (the message lists them). */
export class UnknownPlanInputsError extends AppError {
  readonly code = 'UNKNOWN_PLAN_INPUTS';
  readonly status = 400;
  constructor(readonly functions: string[], readonly sites: string[]) {
    const parts = [
      functions.length > 0 ? `functions ${functions.join(', ')}` : '',
      sites.length > 0 ? `sites ${sites.join(', ')}` : '',
    ].filter(Boolean);
    super(`These do not exist: ${parts.join('; ')}.`);
  }
}

/** The window is not in a state where plans can be run or accepted. */
export class WindowNotPlannableError extends domainError('WINDOW_NOT_PLANNABLE', 409,
  (status: string) => `Move plans are made for assessed, planned or returned windows; this one is ${status}.`) {}

export class ImpactNotCurrentError extends domainError('IMPACT_NOT_CURRENT', 409,
  () => 'The window has no current impact; assess it before planning.') {}

export class QueueUnavailableError extends domainError('QUEUE_UNAVAILABLE', 503,
  (reason: string) => `The plan run could not be queued (${reason}); try again in a moment.`) {}

export class PlanNotCancellableError extends domainError('PLAN_NOT_CANCELLABLE', 409,
  (status: string) => `Only queued or running plans can be cancelled; this one is ${status}.`) {}

/** Accepting was refused; `code` says why (PLAN_NOT_DONE, PLAN_STALE, NETWORK_CHANGED, PLAN_NO_LONGER_FITS). */
export class PlanNotAcceptableError extends AppError {
  readonly status = 409;
  constructor(readonly code: 'PLAN_NOT_DONE' | 'PLAN_STALE' | 'NETWORK_CHANGED' | 'PLAN_NO_LONGER_FITS', message: string) {
    super(message);
  }
}

/** Another run is the window's accepted plan and the request did not name it as the one it replaces. */
export class PlanAlreadyAcceptedError extends domainError('PLAN_ALREADY_ACCEPTED', 409,
  (acceptedPlanId: string) => `Another plan (${acceptedPlanId}) is already accepted for this window; `
    + `to replace it, accept again with replacesPlanId set to ${acceptedPlanId}.`) {}

/** Every slice a plan leaves unresolved must be named in outageAccepted (and nothing else). */
export class OutageNotAcceptedError extends AppError {
  readonly code = 'OUTAGE_NOT_ACCEPTED';
  readonly status = 400;
  constructor(missing: string[], extra: string[]) {
    const parts = [
      missing.length > 0 ? `This plan leaves these slices unresolved; list them in outageAccepted to accept their outage: ${missing.join(', ')}.` : '',
      extra.length > 0 ? `These are not unresolved slices of this plan: ${extra.join(', ')}.` : '',
    ].filter(Boolean);
    super(parts.join(' '));
  }
}
