// Sign-in limits per account (e-mail) and per client address, counted in PostgreSQL so that they survive a
// restart and every API process sees the same attempts.
//
// Each attempt first takes a slot under both keys (a row in sign_in_failures); a successful sign-in gives its
// own slots back, so only failures stay counted. The defaults (5 per account, 20 per address, 15 minutes) follow
// common practice: OWASP's Authentication Cheat Sheet (lock out or slow down after a few failures per account,
// and limit per source too, since one source spraying many accounts stays under any per-account limit) and NIST
// SP 800-63B §5.2.2 (limit consecutive failed attempts; at most 100) — both from memory.
import { ipKeyGenerator } from 'express-rate-limit';
import type { Db } from '../../db/client';
import { lockKeyForTransaction } from '../queries/locks/advisory-locks';
import {
  deleteSignInFailuresBefore, deleteSignInFailuresById, deleteSignInFailuresForKey, insertSignInFailure,
  listRecentSignInFailures, type SignInKeyKind,
} from '../queries/auth/sign-in-failures';
import { SignInLimitedError } from './sign-in-limit-error';

export type SignInLimit = { windowMs: number; perAccount: number; perAddress: number };
export type SignInKeys = { account: string; address: string };
/** The slots one attempt holds until it is known to have failed (kept) or succeeded (given back). */
export type SignInReservation = { keys: SignInKeys; failureIds: number[] };

/** Namespace of the per-key advisory lock (the second key is the hash of "kind:key"). */
const SIGN_IN_LIMIT_LOCK = 7_204_118;
/** Rows are pruned once older than this or the window, whichever is longer (a day of history is cheap). */
const RETENTION_MS = 24 * 60 * 60 * 1000;

/**
 * The account key is the normalised e-mail (unknown addresses count too, so the answer never tells whether an
 * account exists); the address key is the client address, or its /56 prefix for IPv6, where one host owns many.
 */
export function signInKeys(email: string, address: string | undefined): SignInKeys {
  return { account: email.trim().toLowerCase(), address: ipKeyGenerator(address ?? 'unknown') };
}

/**
 * Takes one slot under each key, or throws SignInLimitedError naming the limit that is full.
 * WARNING: one transaction holds both keys' advisory locks (account first, then address: one order, no deadlock)
 * from the count to the insert, so parallel attempts are counted one after another and never exceed a limit.
 */
export async function reserveSignInAttempt(
  db: Db,
  { keys, limit, now }: { keys: SignInKeys; limit: SignInLimit; now: Date },
): Promise<SignInReservation> {
  const since = new Date(now.getTime() - limit.windowMs);
  const checks: { kind: SignInKeyKind; key: string; max: number }[] = [
    { kind: 'account', key: keys.account, max: limit.perAccount },
    { kind: 'address', key: keys.address, max: limit.perAddress },
  ];
  const failureIds = await db.transaction(async (tx) => {
    for (const check of checks) await lockKeyForTransaction(tx, SIGN_IN_LIMIT_LOCK, `${check.kind}:${check.key}`);
    for (const check of checks) {
      const recent = await listRecentSignInFailures(tx, { keyKind: check.kind, key: check.key, since, limit: check.max });
      if (recent.length >= check.max) {
        // A slot frees when the oldest of the newest `max` attempts leaves the window.
        const freeAtMs = recent[check.max - 1].getTime() + limit.windowMs;
        throw new SignInLimitedError(check.kind, Math.max(1, Math.ceil((freeAtMs - now.getTime()) / 1000)));
      }
    }
    const ids: number[] = [];
    for (const check of checks) ids.push(await insertSignInFailure(tx, { keyKind: check.kind, key: check.key, at: now }));
    return ids;
  });
  await deleteSignInFailuresBefore(db, { before: new Date(now.getTime() - Math.max(limit.windowMs, RETENTION_MS)) });
  return { keys, failureIds };
}

/**
 * After a successful sign-in: the attempt's own slots are given back and the account's failures are forgotten
 * (its owner proved the password). The address's earlier failures stay: one good password from an address
 * that is guessing at many accounts must not reset its count.
 */
export async function releaseSignInAttempt(db: Db, reservation: SignInReservation): Promise<void> {
  await deleteSignInFailuresById(db, { ids: reservation.failureIds });
  await deleteSignInFailuresForKey(db, { keyKind: 'account', key: reservation.keys.account });
}
