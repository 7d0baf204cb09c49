// User look-ups for sign-in, the session and the people a mail goes to.
import { and, asc, eq, inArray, isNull, sql } from 'drizzle-orm';
import type { Db, Queryable } from '../../../db/client';
import { passwordCredentials, roleGrants, users } from '../../../db/schema';
import { ROLE_NAMES, type Me, type RoleName } from '../../../shared/api';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';

/** The user's id, password hash and deactivation, matched case-insensitively on e-mail; null when unknown. */
export async function getUserCredentialsByEmail(
  db: Db,
  { email }: { email: string },
): Promise<{ id: string; passwordHash: string; deactivatedAt: Date | null } | null> {
  const rows = await db
    .select({ id: users.id, passwordHash: passwordCredentials.passwordHash, deactivatedAt: users.deactivatedAt })
    .from(users)
    .innerJoin(passwordCredentials, eq(passwordCredentials.userId, users.id))
    .where(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`)
    .limit(1);
  return rows[0] ?? null;
}

const byRoleOrder = (a: RoleName, b: RoleName) => ROLE_NAMES.indexOf(a) - ROLE_NAMES.indexOf(b);

async function getRolesByUserIds(db: Db, userIds: string[]): Promise<Map<string, RoleName[]>> {
  const roles = new Map<string, RoleName[]>();
  if (userIds.length === 0) return roles;
  const rows = await db
    .select({ userId: roleGrants.userId, role: roleGrants.role })
    .from(roleGrants)
    .where(inArray(roleGrants.userId, userIds));
  for (const row of rows) roles.set(row.userId, [...(roles.get(row.userId) ?? []), row.role]);
  for (const list of roles.values()) list.sort(byRoleOrder);
  return roles;
}

const userColumns = { id: users.id, email: users.email, name: users.name, tenantId: users.tenantId, timeZone: users.timeZone };

type UserRow = { id: string; email: string; name: string; tenantId: string | null; timeZone: string | null };

/** A user row as the app reads it: a user who has not chosen a zone reads times in the network's zone. */
function toMe(row: UserRow, roles: RoleName[]): Me {
  return { ...row, roles, timeZone: row.timeZone ?? NETWORK_TIME_ZONE, timeZoneChosen: row.timeZone !== null };
}

/** The user as the app reads it; null when unknown or deactivated (a deactivated user's session and feed stop at once). */
export async function getUserById(db: Db, { id }: { id: string }): Promise<Me | null> {
  const rows = await db.select(userColumns).from(users).where(and(eq(users.id, id), isNull(users.deactivatedAt))).limit(1);
  if (!rows[0]) return null;
  const roles = await getRolesByUserIds(db, [id]);
  return toMe(rows[0], roles.get(id) ?? []);
}

/** Sets (or with null clears) the zone `id` reads times in; returns the zone it had before. */
export async function setUserTimeZone(db: Queryable, { id, timeZone }: { id: string; timeZone: string | null }): Promise<{ before: string | null }> {
  const [row] = await db.select({ timeZone: users.timeZone }).from(users).where(eq(users.id, id)).for('update');
  await db.update(users).set({ timeZone }).where(eq(users.id, id));
  return { before: row?.timeZone ?? null };
}

export type UserContact = { id: string; email: string; name: string };

/** Everyone holding `role` who can sign in (not deactivated, invitation accepted), by e-mail. */
export async function listUsersWithRole(db: Queryable, role: RoleName): Promise<UserContact[]> {
  return db.select({ id: users.id, email: users.email, name: users.name }).from(users)
    .innerJoin(roleGrants, and(eq(roleGrants.userId, users.id), eq(roleGrants.role, role)))
    .where(and(isNull(users.deactivatedAt), eq(users.invitationPending, false)))
    .orderBy(asc(users.email));
}

/** The given users by id (nulls and repeats skipped, unknown ids left out). */
export async function getUsersByIds(db: Queryable, ids: (string | null)[]): Promise<Map<string, UserContact>> {
  const wanted = [...new Set(ids.filter((id): id is string => id !== null))];
  if (wanted.length === 0) return new Map();
  const rows = await db.select({ id: users.id, email: users.email, name: users.name }).from(users)
    .where(inArray(users.id, wanted));
  return new Map(rows.map((r) => [r.id, r]));
}
