// Wrong one-time codes are counted: each is audited (committed, while the attempt's own changes roll back), and
// after OTP_MAX_FAILURES within OTP_FAILURE_WINDOW_MS the user's codes are refused for a while, so the
// ~3-in-a-million chance per guess (three accepted 30-s steps) cannot be multiplied by trying fast.
import type { Db, Tx } from '../../db/client';
import { countAuditEntriesSince, insertAuditEntry } from '../queries/audit/audit-log';
import { lockKeyForTransaction } from '../queries/locks/advisory-locks';
import { OtpCodeInvalidError, OtpCodeReplayedError, OtpLockedError } from './otp-errors';

/** Common practice for second-factor codes: a handful of tries, then a pause (NIST SP 800-63B §5.2.2 asks for a limit; memory). */
export const OTP_MAX_FAILURES = 5;
export const OTP_FAILURE_WINDOW_MS = 15 * 60 * 1000;
const FAILED_ACTION = 'otp.code-failed';
/** Namespace of the per-user advisory lock that serialises code attempts (the second key is the user id's hash). */
const OTP_ATTEMPT_LOCK = 6_170_332;

export async function recentOtpFailures(db: Db | Tx, userId: string, now: Date): Promise<number> {
  const since = new Date(now.getTime() - OTP_FAILURE_WINDOW_MS);
  return countAuditEntriesSince(db, { action: FAILED_ACTION, entity: 'user', entityId: userId, since });
}

type Outcome<T> = { ok: true; value: T } | { ok: false; error: OtpCodeInvalidError | OtpCodeReplayedError };

/**
 * Runs `attempt` (which checks a code) unless the user is locked out; a wrong or reused code is recorded.
 * WARNING: one transaction holds a per-user lock from the count to the failure's audit row, so parallel
 * attempts are evaluated one after another and at most OTP_MAX_FAILURES of them ever check a code. The attempt
 * runs in a savepoint of that transaction: a wrong code undoes its changes but keeps the audit row.
 */
export async function withOtpAttempt<T>(db: Db, userId: string, now: Date, attempt: (tx: Tx) => Promise<T>): Promise<T> {
  const outcome = await db.transaction(async (tx): Promise<Outcome<T>> => {
    await lockKeyForTransaction(tx, OTP_ATTEMPT_LOCK, userId);
    if (await recentOtpFailures(tx, userId, now) >= OTP_MAX_FAILURES) throw new OtpLockedError(OTP_FAILURE_WINDOW_MS / 60_000);
    try {
      return { ok: true, value: await tx.transaction((savepoint) => attempt(savepoint)) };
    } catch (err) {
      if (!(err instanceof OtpCodeInvalidError || err instanceof OtpCodeReplayedError)) throw err;
      await insertAuditEntry(tx, { actorId: userId, action: FAILED_ACTION, entity: 'user', entityId: userId, at: now, after: { code: err.code } });
      return { ok: false, error: err };
    }
  });
  if (!outcome.ok) throw outcome.error;
  return outcome.value;
}
