// Password reset links (one_time_links of kind 'reset') and the password and session writes of a reset or change.
import { and, eq, gt, isNull, ne, sql } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { oneTimeLinks, passwordCredentials, sessions, users } from '../../../db/schema';

export { hashLinkToken, newLinkToken } from '../../../db/queries/one-time-links';

export type ResetCandidate = {
  id: string; email: string; name: string; deactivated: boolean; invitationPending: boolean; hasPassword: boolean;
};

/** The account using `email` (case-insensitive), with what decides whether it may get a reset link; null when none. */
export async function findResetCandidateByEmail(db: Queryable, { email }: { email: string }): Promise<ResetCandidate | null> {
  const [row] = await db.select({
    id: users.id, email: users.email, name: users.name, deactivatedAt: users.deactivatedAt,
    invitationPending: users.invitationPending, passwordHash: passwordCredentials.passwordHash,
  }).from(users)
    .leftJoin(passwordCredentials, eq(passwordCredentials.userId, users.id))
    .where(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`)
    .limit(1);
  if (!row) return null;
  return {
    id: row.id, email: row.email, name: row.name, deactivated: row.deactivatedAt !== null,
    invitationPending: row.invitationPending, hasPassword: row.passwordHash !== null,
  };
}

/** Stores a reset link for the user and drops their earlier unused ones: only the newest link mailed works. */
export async function insertResetLink(
  db: Queryable, { id, userId, email, tokenHash, now, expiresAt }:
    { id: string; userId: string; email: string; tokenHash: string; now: Date; expiresAt: Date },
): Promise<void> {
  await deleteUnusedResetLinks(db, { userId });
  await db.insert(oneTimeLinks).values({ id, kind: 'reset', tokenHash, userId, email, expiresAt, createdAt: now });
}

export async function deleteUnusedResetLinks(db: Queryable, { userId }: { userId: string }): Promise<void> {
  await db.delete(oneTimeLinks).where(and(eq(oneTimeLinks.kind, 'reset'), eq(oneTimeLinks.userId, userId), isNull(oneTimeLinks.usedAt)));
}

export type UsableResetLink = { id: string; userId: string; email: string; name: string };

/**
 * The link and its person when it exists, is unused, has not expired at `now` and its account is active; null
 * otherwise (one answer for all). `lock` holds the link row until the transaction ends, so it is used only once.
 */
export async function findUsableResetLink(
  db: Queryable, { tokenHash, now, lock = false }: { tokenHash: string; now: Date; lock?: boolean },
): Promise<UsableResetLink | null> {
  const query = db.select({ id: oneTimeLinks.id, userId: users.id, email: users.email, name: users.name })
    .from(oneTimeLinks)
    .innerJoin(users, eq(users.id, oneTimeLinks.userId))
    .where(and(
      eq(oneTimeLinks.kind, 'reset'), eq(oneTimeLinks.tokenHash, tokenHash), isNull(oneTimeLinks.usedAt),
      gt(oneTimeLinks.expiresAt, now), isNull(users.deactivatedAt),
    ))
    .limit(1);
  const rows = lock ? await query.for('update', { of: oneTimeLinks }) : await query;
  return rows[0] ?? null;
}

export async function markResetLinkUsed(db: Queryable, { id, now }: { id: string; now: Date }): Promise<void> {
  await db.update(oneTimeLinks).set({ usedAt: now }).where(eq(oneTimeLinks.id, id));
}

/** The user's argon2id hash; null when they have no password (e.g. single sign-on only). */
export async function getPasswordHash(db: Queryable, { userId }: { userId: string }): Promise<string | null> {
  const [row] = await db.select({ passwordHash: passwordCredentials.passwordHash }).from(passwordCredentials)
    .where(eq(passwordCredentials.userId, userId)).limit(1);
  return row?.passwordHash ?? null;
}

export async function setPasswordHash(db: Queryable, { userId, passwordHash, now }: { userId: string; passwordHash: string; now: Date }): Promise<void> {
  await db.insert(passwordCredentials).values({ userId, passwordHash, updatedAt: now })
    .onConflictDoUpdate({ target: passwordCredentials.userId, set: { passwordHash, updatedAt: now } });
}

/** Deletes the user's sessions, all of them or all but `keepSessionId`; the number deleted. */
export async function deleteSessionsOfUserExcept(
  db: Queryable, { userId, keepSessionId = null }: { userId: string; keepSessionId?: string | null },
): Promise<number> {
  const where = keepSessionId ? and(eq(sessions.userId, userId), ne(sessions.id, keepSessionId)) : eq(sessions.userId, userId);
  const rows = await db.delete(sessions).where(where).returning({ id: sessions.id });
  return rows.length;
}
