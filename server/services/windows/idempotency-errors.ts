// Errors of the Idempotency-Key header on booking, each with a fixed code.
import { domainError } from '../../errors';

export class IdempotencyKeyReusedError extends domainError('IDEMPOTENCY_KEY_REUSED', 409,
  () => 'This Idempotency-Key was already used for a different booking in the last 24 hours; send a new key for a new booking.') {}

export class BadIdempotencyKeyError extends domainError('BAD_IDEMPOTENCY_KEY', 400,
  (max: number) => `The Idempotency-Key header must be 1 to ${max} visible ASCII characters (a UUID is a good key).`) {}
