// Invitation links (one_time_links of kind 'invite'): one open link per invited user, stored as its token's hash.
import { randomBytes } from 'node:crypto';
import { and, eq, gt, isNull } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { oneTimeLinks, users } from '../../../db/schema';

export { hashLinkToken, newLinkToken } from '../../../db/queries/one-time-links';

/** Removes the user's unused invitation links (a resend or a revoke: the old link stops working). */
export async function deleteOpenInviteLinks(db: Queryable, userId: string): Promise<void> {
  await db.delete(oneTimeLinks).where(and(eq(oneTimeLinks.kind, 'invite'), eq(oneTimeLinks.userId, userId), isNull(oneTimeLinks.usedAt)));
}

export async function insertInviteLink(
  db: Queryable, p: { userId: string; email: string; tokenHash: string; now: Date; expiresAt: Date },
): Promise<void> {
  await db.insert(oneTimeLinks).values({
    id: `link-${randomBytes(9).toString('base64url')}`, kind: 'invite', tokenHash: p.tokenHash, userId: p.userId, email: p.email,
    expiresAt: p.expiresAt, createdAt: p.now,
  });
}

export type UsableInviteLink = { id: string; userId: string; email: string; name: string; tenantId: string | null };

/** The link and its invitee when it exists, is unused, has not expired and its invitee still waits; else null. */
export async function findUsableInviteLink(
  db: Queryable, { tokenHash, now, lock = false }: { tokenHash: string; now: Date; lock?: boolean },
): Promise<UsableInviteLink | null> {
  const query = db.select({ id: oneTimeLinks.id, userId: users.id, email: users.email, name: users.name, tenantId: users.tenantId })
    .from(oneTimeLinks)
    .innerJoin(users, eq(users.id, oneTimeLinks.userId))
    .where(and(
      eq(oneTimeLinks.kind, 'invite'), eq(oneTimeLinks.tokenHash, tokenHash), isNull(oneTimeLinks.usedAt), gt(oneTimeLinks.expiresAt, now),
      eq(users.invitationPending, true), isNull(users.deactivatedAt),
    )).limit(1);
  const rows = lock ? await query.for('update', { of: oneTimeLinks }) : await query;
  return rows[0] ?? null;
}

export async function markInviteLinkUsed(db: Queryable, { id, now }: { id: string; now: Date }): Promise<void> {
  await db.update(oneTimeLinks).set({ usedAt: now }).where(eq(oneTimeLinks.id, id));
}
