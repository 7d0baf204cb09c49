// Errors of single sign-on. A failed sign-in through the issuer is not an API error: the browser is sent back to
// the sign-in screen with a reason code, so it carries that code instead of a status.
import { domainError } from '../../errors';
import type { SsoErrorCode } from '../../../shared/sso';

export class SsoSignInError extends Error {
  constructor(readonly reason: SsoErrorCode, detail?: string) {
    super(`single sign-on refused (${reason})${detail ? `: ${detail}` : ''}`);
  }
}

export class SsoLastAdminError extends domainError('SSO_LAST_ADMIN', 409, () =>
  'Password sign-in stays on for staff until at least one admin has signed in with single sign-on, so that ' +
  'someone can still manage Slackwater. Sign in once with single sign-on as an admin, then turn it off.') {}

export class SsoSecretRequiredError extends domainError('SSO_SECRET_REQUIRED', 400, () =>
  'Enter the client secret the issuer gave you.') {}

export class PasswordSignInOffError extends domainError('PASSWORD_SIGN_IN_OFF', 403, (name: string) =>
  `Staff sign in with ${name}: password sign-in is turned off for staff accounts.`) {}
