// Errors of one-time-code enrolment and checks, each with a fixed code (the app words its messages by code).
import { AppError } from '../errors';

export class OtpCodeRequiredError extends AppError {
  readonly code = 'CODE_REQUIRED';
  readonly status = 400;
  constructor() {
    super('Confirm this decision with the 6-digit code from your authenticator app.');
  }
}

export class OtpCodeInvalidError extends AppError {
  readonly code = 'CODE_INVALID';
  readonly status = 403;
  constructor() {
    super('That code is not right. Check your authenticator app (and its clock) and try the current code.');
  }
}

export class OtpCodeReplayedError extends AppError {
  readonly code = 'CODE_REPLAYED';
  readonly status = 403;
  constructor() {
    super('That code was already used. Wait for the next code in your authenticator app.');
  }
}

export class OtpNotEnrolledError extends AppError {
  readonly code = 'OTP_NOT_ENROLLED';
  readonly status = 403;
  constructor() {
    super('Set up one-time codes first (Security), then confirm the decision with a code.');
  }
}

export class OtpAlreadyEnrolledError extends AppError {
  readonly code = 'OTP_ALREADY_ENROLLED';
  readonly status = 409;
  constructor() {
    super('One-time codes are already set up for you. Remove them first to enrol a new authenticator.');
  }
}

export class OtpNotStartedError extends AppError {
  readonly code = 'OTP_NOT_STARTED';
  readonly status = 409;
  constructor() {
    super('There is no enrolment waiting for a code; start the set-up again.');
  }
}
