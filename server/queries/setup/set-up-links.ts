// Set-up links (one_time_links of kind 'set-up'): find a usable one by its token's hash, mark it used.
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { oneTimeLinks } from '../../../db/schema';

export { hashLinkToken } from '../../../db/queries/one-time-links';
export { countAdmins, findUserByEmail, insertAdminAccount } from '../../../db/queries/admin-accounts';

/** The link's id when it exists, is unused and has not expired at `now`; null otherwise (one answer for all three). */
export async function findUsableSetUpLink(
  db: Queryable, { tokenHash, now, lock = false }: { tokenHash: string; now: Date; lock?: boolean },
): Promise<string | null> {
  const query = db.select({ id: oneTimeLinks.id }).from(oneTimeLinks).where(and(
    eq(oneTimeLinks.kind, 'set-up'), eq(oneTimeLinks.tokenHash, tokenHash), isNull(oneTimeLinks.usedAt), gt(oneTimeLinks.expiresAt, now),
  )).limit(1);
  const rows = lock ? await query.for('update') : await query;
  return rows[0]?.id ?? null;
}

export async function markLinkUsed(db: Queryable, { id, now, userId }: { id: string; now: Date; userId: string }): Promise<void> {
  await db.update(oneTimeLinks).set({ usedAt: now, userId }).where(eq(oneTimeLinks.id, id));
}
