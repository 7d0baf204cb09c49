// Errors of one-time-code enrolment and checks, each with a fixed code (the app words its messages by code).
import { domainError } from '../errors';

export class OtpCodeRequiredError extends domainError('CODE_REQUIRED', 400,
  () => 'Confirm this decision with the 6-digit code from your authenticator app.') {}

export class OtpCodeInvalidError extends domainError('CODE_INVALID', 403,
  () => 'That code is not right. Check your authenticator app (and its clock) and try the current code.') {}

export class OtpCodeReplayedError extends domainError('CODE_REPLAYED', 403,
  () => 'That code was already used. Wait for the next code in your authenticator app.') {}

export class OtpNotEnrolledError extends domainError('OTP_NOT_ENROLLED', 403,
  () => 'Set up one-time codes first (Security), then confirm the decision with a code.') {}

export class OtpAlreadyEnrolledError extends domainError('OTP_ALREADY_ENROLLED', 409,
  () => 'One-time codes are already set up for you. Remove them first to enrol a new authenticator.') {}

export class OtpNotStartedError extends domainError('OTP_NOT_STARTED', 409,
  () => 'There is no enrolment waiting for a code; start the set-up again.') {}

export class OtpLockedError extends domainError('CODE_LOCKED', 429,
  (minutes: number) => `Too many wrong codes. Codes are refused for up to ${minutes} minutes; then try the current code again.`) {}
