// Opening a one-time link (set-up, invitation, password reset) counts against the sign-in limits, keyed by the
// client's address, so guessing tokens stays slow; a full limit says so in words about links, not sign-ins.
import type { Queryable } from '../../db/client';
import { reserveSignInAttempt, signInKeys, type SignInLimit } from './sign-in-limit';
import { SignInLimitedError } from './sign-in-limit-error';

export type LinkKind = 'set-up' | 'invitation' | 'reset';

export async function reserveLinkCheck(
  db: Queryable, { link, address, limit, now }: { link: LinkKind; address: string | undefined; limit: SignInLimit; now: Date },
): ReturnType<typeof reserveSignInAttempt> {
  try {
    return await reserveSignInAttempt(db, { keys: signInKeys(`${link}-link@${address ?? 'unknown'}`, address), limit, now });
  } catch (err) {
    if (err instanceof SignInLimitedError) throw new SignInLimitedError('link', err.retryAfterSeconds);
    throw err;
  }
}
