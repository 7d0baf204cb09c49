// Changing one's own password on the Security screen: the current password first, then the policy; the other
// sessions end (a leaked password's sessions with them), this one stays.
import type { Db } from '../../db/client';
import { domainError } from '../errors';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { deleteSessionsOfUserExcept, getPasswordHash, setPasswordHash } from '../queries/auth/password-links';
import { hashPassword, verifyDummyPassword, verifyPassword } from './password';
import { assertPasswordAcceptable } from './password-policy';
import { releaseSignInAttempt, reserveSignInAttempt, signInKeys, type SignInLimit } from './sign-in-limit';

/** 400, not 401: the session is fine, only the typed password is not (a 401 would send the app to sign-in). */
export class CurrentPasswordWrongError extends domainError('CURRENT_PASSWORD_WRONG', 400,
  () => 'Your current password is not correct.') {}

export class SamePasswordError extends domainError('SAME_PASSWORD', 400,
  () => 'The new password is the one you have now. Choose a different one.') {}

export type ChangePasswordInput = {
  user: { id: string; email: string; name: string };
  sessionId: string;
  currentPassword: string;
  newPassword: string;
  now: Date;
  /** the client address the sign-in limits count under */
  address?: string;
  limit: SignInLimit;
};

export async function changePassword(db: Db, input: ChangePasswordInput): Promise<{ otherSessionsEnded: number }> {
  const { user, now } = input;
  // Guessing the current password from an open session counts like failed sign-ins to the same account.
  const reservation = await reserveSignInAttempt(db, { keys: signInKeys(user.email, input.address), limit: input.limit, now });
  const currentHash = await getPasswordHash(db, { userId: user.id });
  const currentOk = currentHash ? await verifyPassword(currentHash, input.currentPassword) : await verifyDummyPassword(input.currentPassword);
  if (!currentHash || !currentOk) {
    await insertAuditEntry(db, { actorId: user.id, action: 'password-change-refused', entity: 'user', entityId: user.id, at: now, after: { reason: 'current password wrong' } });
    throw new CurrentPasswordWrongError();
  }
  await releaseSignInAttempt(db, reservation);
  if (await verifyPassword(currentHash, input.newPassword)) throw new SamePasswordError();
  assertPasswordAcceptable(input.newPassword, user);
  const passwordHash = await hashPassword(input.newPassword);
  return db.transaction(async (tx) => {
    await setPasswordHash(tx, { userId: user.id, passwordHash, now });
    const otherSessionsEnded = await deleteSessionsOfUserExcept(tx, { userId: user.id, keepSessionId: input.sessionId });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'password-changed', entity: 'user', entityId: user.id, at: now, after: { otherSessionsEnded },
    });
    return { otherSessionsEnded };
  });
}
