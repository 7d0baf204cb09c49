// How often a reset link may be asked for: per e-mail address (known or not, so the limit tells nothing about
// accounts) and per client address, counted in the sign-in limit's table under keys of their own.
import { ipKeyGenerator } from 'express-rate-limit';
import type { Db } from '../../db/client';
import { reserveSignInAttempt, type SignInLimit } from './sign-in-limit';
import { SignInLimitedError } from './sign-in-limit-error';

/** 3 mails an hour to one address is enough for a lost first mail; 20 from one network covers an office. */
export const RESET_REQUEST_LIMIT: SignInLimit = { windowMs: 60 * 60 * 1000, perAccount: 3, perAddress: 20 };

/** A full reset-request limit: 429 RATE_LIMITED with Retry-After, worded for this request. */
export class ResetRequestLimitedError extends SignInLimitedError {
  constructor(limitKind: SignInLimitedError['limitKind'], retryAfterSeconds: number) {
    super(limitKind, retryAfterSeconds);
    const minutes = Math.ceil(retryAfterSeconds / 60);
    this.message = `Too many reset links asked for ${limitKind === 'account' ? 'this e-mail address' : 'from your network address'}. ` +
      `Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`;
  }
}

/** Counts one request (they all stay counted); throws ResetRequestLimitedError when a limit is full. */
export async function countResetRequest(
  db: Db, { email, address, now, limit = RESET_REQUEST_LIMIT }: { email: string; address: string | undefined; now: Date; limit?: SignInLimit },
): Promise<void> {
  const keys = { account: `reset:${email.trim().toLowerCase()}`, address: `reset:${ipKeyGenerator(address ?? 'unknown')}` };
  try {
    await reserveSignInAttempt(db, { keys, limit, now });
  } catch (err) {
    if (err instanceof SignInLimitedError) throw new ResetRequestLimitedError(err.limitKind, err.retryAfterSeconds);
    throw err;
  }
}
