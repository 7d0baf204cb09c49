// Issuer accounts linked to users, and the user facts single sign-on decides on.
import { randomUUID } from 'node:crypto';
import { and, eq, inArray, sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { roleGrants, ssoIdentities, users } from '../../../db/schema';
import type { RoleName } from '../../../shared/api';

export type SsoUserFacts = { id: string; email: string; tenantId: string | null; deactivated: boolean; roles: RoleName[] };

async function factsWhere(db: Queryable, where: SQL): Promise<SsoUserFacts | null> {
  const [row] = await db.select({ id: users.id, email: users.email, tenantId: users.tenantId, deactivatedAt: users.deactivatedAt })
    .from(users).where(where).limit(1);
  if (!row) return null;
  const grants = await db.select({ role: roleGrants.role }).from(roleGrants).where(eq(roleGrants.userId, row.id));
  return { id: row.id, email: row.email, tenantId: row.tenantId, deactivated: row.deactivatedAt !== null, roles: grants.map((g) => g.role) };
}

/** The user an issuer account is linked to, or null on its first sign-in. */
export async function getUserByIdentity(db: Queryable, { issuer, subject }: { issuer: string; subject: string }): Promise<SsoUserFacts | null> {
  const [link] = await db.select({ userId: ssoIdentities.userId }).from(ssoIdentities)
    .where(and(eq(ssoIdentities.issuer, issuer), eq(ssoIdentities.subject, subject))).limit(1);
  return link ? factsWhere(db, eq(users.id, link.userId)) : null;
}

/** The user with this e-mail, matched case-insensitively as password sign-in does. */
export async function getUserFactsByEmail(db: Queryable, email: string): Promise<SsoUserFacts | null> {
  return factsWhere(db, sql`lower(${users.email}) = ${email.trim().toLowerCase()}`);
}

export async function insertSsoUser(db: Queryable, { email, name, now }: { email: string; name: string; now: Date }): Promise<string> {
  const id = `user-${randomUUID()}`;
  await db.insert(users).values({ id, email: email.trim(), name, createdAt: now });
  return id;
}

export async function linkIdentity(db: Queryable, link: { issuer: string; subject: string; userId: string; now: Date }): Promise<void> {
  await db.insert(ssoIdentities).values({
    issuer: link.issuer, subject: link.subject, userId: link.userId, createdAt: link.now, lastSignInAt: link.now,
  }).onConflictDoUpdate({ target: [ssoIdentities.issuer, ssoIdentities.subject], set: { lastSignInAt: link.now } });
}

/** Signing in through the issuer ends a pending invitation: the invitee has an account they can use. */
export async function clearInvitationPending(db: Queryable, userId: string): Promise<void> {
  await db.update(users).set({ invitationPending: false }).where(eq(users.id, userId));
}

/** Makes `roles` the user's roles: grants the missing ones, withdraws the others. */
export async function replaceRoles(db: Queryable, { userId, roles, now }: { userId: string; roles: RoleName[]; now: Date }): Promise<void> {
  const current = (await db.select({ role: roleGrants.role }).from(roleGrants).where(eq(roleGrants.userId, userId))).map((g) => g.role);
  const withdrawn = current.filter((r) => !roles.includes(r));
  if (withdrawn.length > 0) await db.delete(roleGrants).where(and(eq(roleGrants.userId, userId), inArray(roleGrants.role, withdrawn)));
  const granted = roles.filter((r) => !current.includes(r));
  if (granted.length > 0) await db.insert(roleGrants).values(granted.map((role) => ({ userId, role, grantedAt: now })));
}

/** Admins who have signed in through the issuer at least once and are not deactivated: they can still get in
 * when staff password sign-in is off. */
export async function countAdminsWithSso(db: Queryable, issuer: string): Promise<number> {
  const rows = await db.selectDistinct({ userId: ssoIdentities.userId }).from(ssoIdentities)
    .innerJoin(roleGrants, and(eq(roleGrants.userId, ssoIdentities.userId), eq(roleGrants.role, 'admin')))
    .innerJoin(users, eq(users.id, ssoIdentities.userId))
    .where(and(eq(ssoIdentities.issuer, issuer), sql`${users.deactivatedAt} is null`));
  return rows.length;
}
