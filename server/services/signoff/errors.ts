// Domain errors of submitting for sign-off and deciding, each with a fixed code and HTTP status.
import { AppError } from '../../errors';

export class SelfSignoffError extends AppError {
  readonly code = 'SELF_SIGNOFF';
  readonly status = 403;
  constructor() {
    super('You booked this window or made or accepted its plan, so another approver must decide on it.');
  }
}

export class AlreadyDecidedError extends AppError {
  readonly code = 'ALREADY_DECIDED';
  readonly status = 409;
  constructor() {
    super('You have already decided on this window in this review round.');
  }
}

export class NotInReviewError extends AppError {
  readonly code = 'NOT_IN_REVIEW';
  readonly status = 409;
  constructor(status: string) {
    super(`The window is ${status}, not in review, so it takes no decisions now.`);
  }
}

export class NoAcceptedPlanError extends AppError {
  readonly code = 'NO_ACCEPTED_PLAN';
  readonly status = 409;
  constructor() {
    super('The window has no accepted move plan with a finished review; accept a plan first.');
  }
}

export class SignoffNotFoundError extends AppError {
  readonly code = 'SIGNOFF_NOT_FOUND';
  readonly status = 404;
  constructor(windowId: string) {
    super(`Window ${windowId} has no accepted plan to sign off.`);
  }
}
