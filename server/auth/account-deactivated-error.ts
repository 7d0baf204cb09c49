// Sign-in by a deactivated account: said plainly (after the password was right), so the person knows whom to ask.
import { domainError } from '../errors';

export class AccountDeactivatedError extends domainError('ACCOUNT_DEACTIVATED', 403,
  () => 'This account is deactivated. Ask an admin of your Slackwater to reactivate it.') {}
