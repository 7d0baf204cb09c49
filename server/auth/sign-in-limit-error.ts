// The answer when a sign-in limit is full: 429 RATE_LIMITED, with the seconds to wait for Retry-After.
import { AppError } from '../errors';

export class SignInLimitedError extends AppError {
  override readonly code = 'RATE_LIMITED';
  override readonly status = 429;

  constructor(readonly limitKind: 'account' | 'address' | 'link', readonly retryAfterSeconds: number) {
    const minutes = Math.ceil(retryAfterSeconds / 60);
    const wait = `Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`;
    const what = {
      account: 'Too many failed sign-in attempts for this e-mail address.',
      address: 'Too many failed sign-in attempts from your network address.',
      link: 'Too many links that did not work were opened from your network address.',
    }[limitKind];
    super(`${what} ${wait}`);
  }
}
