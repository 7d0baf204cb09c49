// Rows of `user_otp_keys`: one TOTP key per user, unconfirmed until a first code proves the authenticator.
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { userOtpKeys } from '../../../db/schema';

export type OtpKeyRow = typeof userOtpKeys.$inferSelect;

/** The user's key; `forUpdate` holds the row until the transaction ends (two requests cannot spend one code). */
export async function selectOtpKey(db: Queryable, userId: string, opts: { forUpdate?: boolean } = {}): Promise<OtpKeyRow | null> {
  const query = db.select().from(userOtpKeys).where(eq(userOtpKeys.userId, userId));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  return row ?? null;
}

/** A fresh unconfirmed key, replacing any the user had. */
export async function upsertOtpKey(db: Queryable, key: { userId: string; keyBase32: string; now: Date }): Promise<void> {
  const { userId, keyBase32, now } = key;
  await db.insert(userOtpKeys).values({ userId, keyBase32, createdAt: now })
    .onConflictDoUpdate({ target: userOtpKeys.userId, set: { keyBase32, confirmedAt: null, lastUsedStep: null, createdAt: now } });
}

/** Records the step of the code just spent; `confirmedAt` also confirms the key. */
export async function updateOtpKeyStep(db: Queryable, userId: string, change: { lastUsedStep: number; confirmedAt?: Date }): Promise<void> {
  await db.update(userOtpKeys).set(change).where(eq(userOtpKeys.userId, userId));
}

/** True when the user had a key. */
export async function deleteOtpKey(db: Queryable, userId: string): Promise<boolean> {
  const removed = await db.delete(userOtpKeys).where(eq(userOtpKeys.userId, userId)).returning({ userId: userOtpKeys.userId });
  return removed.length > 0;
}
