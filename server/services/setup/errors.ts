// Errors of the first-admin set-up.
import { domainError } from '../../errors';

/** Expired, used and unknown links get the same answer, so a guess learns nothing about which it hit. */
export class SetUpLinkInvalidError extends domainError('SETUP_LINK_INVALID', 404,
  () => 'This set-up link does not work any more: it was used, it expired (links last 24 hours) or it is not complete. Restart the server to print a new one.') {}

export class AlreadySetUpError extends domainError('ALREADY_SET_UP', 409,
  () => 'This instance already has an admin. Sign in instead.') {}

export class EmailInUseError extends domainError('EMAIL_IN_USE', 409,
  () => 'An account with this e-mail address already exists. Use another address.') {}
