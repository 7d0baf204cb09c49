// Forgotten passwords: mail a one-time reset link (1 hour, single use) to an active account, and turn a working
// link into a new password that ends every session of its user.
import { randomBytes } from 'node:crypto';
import type { Db } from '../../db/client';
import { RESET_LINK_VALID_MINUTES } from '../../shared/passwords';
import { domainError } from '../errors';
import { passwordResetMail } from '../mail/password-reset-mail';
import { insertAuditEntry } from '../queries/audit/audit-log';
import {
  deleteSessionsOfUserExcept, deleteUnusedResetLinks, findResetCandidateByEmail, findUsableResetLink, hashLinkToken,
  insertResetLink, markResetLinkUsed, newLinkToken, setPasswordHash,
} from '../queries/auth/password-links';
import type { MailQueue } from '../services/ports';
import { hashPassword } from './password';
import { assertPasswordAcceptable } from './password-policy';

/** Expired, used, unknown and deactivated-account links get one answer, so a guess learns nothing. */
export class ResetLinkInvalidError extends domainError('RESET_LINK_INVALID', 404,
  () => `This reset link does not work any more: it was used, it expired (links last ${RESET_LINK_VALID_MINUTES} minutes) or it is not complete. Ask for a new one.`) {}

/**
 * Mails a reset link when an active account with a password uses `email`; otherwise mails nothing. Either way one
 * audit row records the request (never the token). Runs after the caller has answered, so its time tells nothing.
 */
export async function requestPasswordReset(
  db: Db, mail: MailQueue, { email, now, publicUrl }: { email: string; now: Date; publicUrl: string },
): Promise<{ mailed: boolean }> {
  const person = await findResetCandidateByEmail(db, { email });
  const asked = email.trim().toLowerCase();
  // Deactivated people get no mail; invitees set their first password from the invitation instead.
  if (!person || person.deactivated || person.invitationPending || !person.hasPassword) {
    await insertAuditEntry(db, {
      actorId: null, action: 'password-reset-requested', entity: 'user', entityId: person?.id ?? null, at: now,
      after: { email: asked, mailed: false },
    });
    return { mailed: false };
  }
  const token = newLinkToken();
  await db.transaction(async (tx) => {
    await insertResetLink(tx, {
      id: `link-${randomBytes(9).toString('base64url')}`, userId: person.id, email: person.email, tokenHash: hashLinkToken(token),
      now, expiresAt: new Date(now.getTime() + RESET_LINK_VALID_MINUTES * 60_000),
    });
    await insertAuditEntry(tx, {
      actorId: null, action: 'password-reset-requested', entity: 'user', entityId: person.id, at: now, after: { email: asked, mailed: true },
    });
  });
  await mail.sendMail(passwordResetMail(publicUrl, { to: person.email, name: person.name, token }));
  return { mailed: true };
}

export async function checkResetLink(db: Db, { token, now }: { token: string; now: Date }): Promise<void> {
  if (!(await findUsableResetLink(db, { tokenHash: hashLinkToken(token), now }))) throw new ResetLinkInvalidError();
}

/** Sets the new password, uses up the link and ends every session of its user; returns how many ended. */
export async function resetPassword(db: Db, { token, password, now }: { token: string; password: string; now: Date }): Promise<{ ended: number }> {
  const tokenHash = hashLinkToken(token);
  const link = await findUsableResetLink(db, { tokenHash, now });
  if (!link) throw new ResetLinkInvalidError();
  // Before the link is used: a refused password leaves it working, so the person can try another.
  assertPasswordAcceptable(password, link);
  const passwordHash = await hashPassword(password);
  return db.transaction(async (tx) => {
    // Locked and checked again: of two uses at once, the second finds the link used.
    const locked = await findUsableResetLink(tx, { tokenHash, now, lock: true });
    if (!locked || locked.id !== link.id) throw new ResetLinkInvalidError();
    await setPasswordHash(tx, { userId: locked.userId, passwordHash, now });
    await markResetLinkUsed(tx, { id: locked.id, now });
    await deleteUnusedResetLinks(tx, { userId: locked.userId });
    const ended = await deleteSessionsOfUserExcept(tx, { userId: locked.userId });
    await insertAuditEntry(tx, {
      actorId: locked.userId, action: 'password-reset', entity: 'user', entityId: locked.userId, at: now, after: { sessionsEnded: ended },
    });
    return { ended };
  });
}
