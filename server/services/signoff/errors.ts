// Domain errors of submitting for sign-off and deciding, each with a fixed code and HTTP status.
import { domainError } from '../../errors';

export class SelfSignoffError extends domainError('SELF_SIGNOFF', 403,
  () => 'You booked this window or made or accepted its plan, so another approver must decide on it.') {}

export class AlreadyDecidedError extends domainError('ALREADY_DECIDED', 409,
  () => 'You have already decided on this window in this review round.') {}

export class NotInReviewError extends domainError('NOT_IN_REVIEW', 409,
  (status: string) => `The window is ${status}, not in review, so it takes no decisions now.`) {}

export class NoAcceptedPlanError extends domainError('NO_ACCEPTED_PLAN', 409,
  () => 'The window has no accepted move plan with a finished review; accept a plan first.') {}

export class SignoffNotFoundError extends domainError('SIGNOFF_NOT_FOUND', 404,
  (windowId: string) => `Window ${windowId} has no accepted plan to sign off.`) {}

/** A high-risk plan must never need fewer approvals than a low-risk one. */
export class QuorumOrderError extends domainError('QUORUM_ORDER', 400,
  (low: number, high: number) =>
    `High-risk plans would need ${high} approval${high === 1 ? '' : 's'}, fewer than the ${low} low-risk plans need; `
    + `set high risk to ${low} or more, or lower low risk.`) {}
