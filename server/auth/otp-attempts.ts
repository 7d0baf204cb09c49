// Wrong one-time codes are counted: each is audited (committed on its own, the decision's transaction rolls
// back), and after OTP_MAX_FAILURES within OTP_FAILURE_WINDOW_MS the user's codes are refused for a while, so
// the ~3-in-a-million chance per guess (three accepted 30-s steps) cannot be multiplied by trying fast.
import type { Db } from '../../db/client';
import { countAuditEntriesSince, insertAuditEntry } from '../queries/audit/audit-log';
import { OtpCodeInvalidError, OtpCodeReplayedError, OtpLockedError } from './otp-errors';

/** Common practice for second-factor codes: a handful of tries, then a pause (NIST SP 800-63B §5.2.2 asks for a limit; memory). */
export const OTP_MAX_FAILURES = 5;
export const OTP_FAILURE_WINDOW_MS = 15 * 60 * 1000;
const FAILED_ACTION = 'otp.code-failed';

export async function recentOtpFailures(db: Db, userId: string, now: Date): Promise<number> {
  const since = new Date(now.getTime() - OTP_FAILURE_WINDOW_MS);
  return countAuditEntriesSince(db, { action: FAILED_ACTION, entity: 'user', entityId: userId, since });
}

/** Runs `attempt` (which checks a code) unless the user is locked out; a wrong or reused code is recorded. */
export async function withOtpAttempt<T>(db: Db, userId: string, now: Date, attempt: () => Promise<T>): Promise<T> {
  if (await recentOtpFailures(db, userId, now) >= OTP_MAX_FAILURES) throw new OtpLockedError(OTP_FAILURE_WINDOW_MS / 60_000);
  try {
    return await attempt();
  } catch (err) {
    if (err instanceof OtpCodeInvalidError || err instanceof OtpCodeReplayedError) {
      await insertAuditEntry(db, { actorId: userId, action: FAILED_ACTION, entity: 'user', entityId: userId, at: now, after: { code: err.code } });
    }
    throw err;
  }
}
