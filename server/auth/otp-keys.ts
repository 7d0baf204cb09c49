// Each user's TOTP key: enrol (unconfirmed), confirm with a first code, remove, and spend a code on a decision.
import QRCode from 'qrcode';
import type { OtpEnrolment, OtpStatus } from '../../shared/signoff';
import { insertAuditEntry } from '../queries/audit/audit-log';
import type { Queryable } from '../../db/client';
import { deleteOtpKey, selectOtpKey, updateOtpKeyStep, upsertOtpKey } from '../queries/auth/otp-keys';
import { checkOtpCode, decodeOtpKey, encodeOtpKey, newOtpKey, otpKeyUri } from './otp';
import {
  OtpAlreadyEnrolledError, OtpCodeInvalidError, OtpCodeReplayedError, OtpNotEnrolledError, OtpNotStartedError,
} from './otp-errors';

type Actor = { id: string; email: string };

export async function getOtpStatus(db: Queryable, userId: string): Promise<OtpStatus> {
  const row = await selectOtpKey(db, userId);
  return { enrolled: row?.confirmedAt != null, confirmedAt: row?.confirmedAt?.toISOString() ?? null };
}

/** A new unconfirmed key (replacing an unconfirmed one); a confirmed key must be removed first. */
export async function enrolOtp(db: Queryable, user: Actor, now: Date): Promise<OtpEnrolment> {
  const existing = await selectOtpKey(db, user.id, { forUpdate: true });
  if (existing?.confirmedAt) throw new OtpAlreadyEnrolledError();
  const key = newOtpKey();
  const keyBase32 = encodeOtpKey(key);
  await upsertOtpKey(db, { userId: user.id, keyBase32, now });
  await insertAuditEntry(db, { actorId: user.id, action: 'otp.enrol', entity: 'user', entityId: user.id, at: now });
  const uri = otpKeyUri(user.email, key);
  // Margin of 2 modules: enough quiet zone for phone cameras on a white card.
  const qrSvg = await QRCode.toString(uri, { type: 'svg', margin: 2, errorCorrectionLevel: 'M' });
  return { uri, keyBase32, qrSvg };
}

/** The first good code proves the authenticator holds the key; from then on decisions can require codes. */
export async function confirmOtp(db: Queryable, userId: string, code: string, now: Date): Promise<OtpStatus> {
  const row = await selectOtpKey(db, userId, { forUpdate: true });
  if (!row) throw new OtpNotStartedError();
  if (row.confirmedAt) throw new OtpAlreadyEnrolledError();
  const step = stepOf(row, code, now);
  await updateOtpKeyStep(db, userId, { confirmedAt: now, lastUsedStep: step });
  await insertAuditEntry(db, { actorId: userId, action: 'otp.confirm', entity: 'user', entityId: userId, at: now });
  return { enrolled: true, confirmedAt: now.toISOString() };
}

export async function removeOtp(db: Queryable, userId: string, actorId: string, now: Date): Promise<boolean> {
  const removed = await deleteOtpKey(db, userId);
  if (removed) await insertAuditEntry(db, { actorId, action: 'otp.remove', entity: 'user', entityId: userId, at: now });
  return removed;
}

/**
 * Checks a code against the user's confirmed key and records its step as used, inside the caller's transaction
 * (the row is locked, so two requests cannot spend the same code). Throws on a bad or reused code.
 */
export async function spendOtpCode(tx: Queryable, userId: string, code: string, now: Date): Promise<void> {
  const row = await selectOtpKey(tx, userId, { forUpdate: true });
  if (!row?.confirmedAt) throw new OtpNotEnrolledError();
  const step = stepOf(row, code, now);
  await updateOtpKeyStep(tx, userId, { lastUsedStep: step });
}

function stepOf(row: { keyBase32: string; lastUsedStep: number | null }, code: string, now: Date): number {
  const check = checkOtpCode(decodeOtpKey(row.keyBase32), code, now, row.lastUsedStep);
  if (!check.ok) throw check.reason === 'replayed' ? new OtpCodeReplayedError() : new OtpCodeInvalidError();
  return check.step;
}
