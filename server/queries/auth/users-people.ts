// The People screen's SQL: list and filter users, add an invited user, change roles, deactivate, count admins.
import { randomUUID } from 'node:crypto';
import { and, asc, count, eq, gt, ilike, inArray, isNotNull, isNull, max, or, sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { oneTimeLinks, passwordCredentials, roleGrants, sessions, tenants, users } from '../../../db/schema';
import { ROLE_NAMES, type RoleName } from '../../../shared/api';
import type { PeopleFilter, Person, PersonStatus } from '../../../shared/people';

const byRoleOrder = (a: RoleName, b: RoleName) => ROLE_NAMES.indexOf(a) - ROLE_NAMES.indexOf(b);

/** `%`, `_` and `\` stand for themselves in the search text. */
const likePattern = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

function statusCondition(status: PersonStatus): SQL | undefined {
  if (status === 'deactivated') return isNotNull(users.deactivatedAt);
  if (status === 'invited') return and(isNull(users.deactivatedAt), eq(users.invitationPending, true));
  return and(isNull(users.deactivatedAt), eq(users.invitationPending, false));
}

function statusOf(row: { deactivatedAt: Date | null; invitationPending: boolean }): PersonStatus {
  if (row.deactivatedAt) return 'deactivated';
  return row.invitationPending ? 'invited' : 'active';
}

/** Everyone matching the filter (all when it is empty), by name then e-mail, with roles and open invitation. */
export async function listPeople(db: Queryable, filter: Partial<PeopleFilter> & { ids?: string[] }, now: Date): Promise<Person[]> {
  const conditions = [
    filter.q ? or(ilike(users.name, likePattern(filter.q)), ilike(users.email, likePattern(filter.q))) : undefined,
    filter.role ? inArray(users.id, db.select({ id: roleGrants.userId }).from(roleGrants).where(eq(roleGrants.role, filter.role))) : undefined,
    filter.tenant ? eq(users.tenantId, filter.tenant) : undefined,
    filter.status ? statusCondition(filter.status) : undefined,
    filter.ids ? inArray(users.id, filter.ids) : undefined,
  ];
  const openLinks = db.select({ userId: oneTimeLinks.userId, expiresAt: max(oneTimeLinks.expiresAt).as('expires_at') })
    .from(oneTimeLinks)
    .where(and(eq(oneTimeLinks.kind, 'invite'), isNull(oneTimeLinks.usedAt), gt(oneTimeLinks.expiresAt, now)))
    .groupBy(oneTimeLinks.userId).as('open_links');
  const rows = await db.select({
    id: users.id, email: users.email, name: users.name, tenantId: users.tenantId, tenantName: tenants.name,
    createdAt: users.createdAt, deactivatedAt: users.deactivatedAt, invitationPending: users.invitationPending,
    invitationExpiresAt: openLinks.expiresAt,
  }).from(users)
    .leftJoin(tenants, eq(tenants.id, users.tenantId))
    .leftJoin(openLinks, eq(openLinks.userId, users.id))
    .where(and(...conditions))
    .orderBy(asc(sql`lower(${users.name})`), asc(users.email));
  const roles = await rolesOf(db, rows.map((r) => r.id));
  return rows.map((row) => ({
    id: row.id, email: row.email, name: row.name, tenantId: row.tenantId, tenantName: row.tenantName ?? null,
    roles: roles.get(row.id) ?? [],
    status: statusOf(row),
    createdAt: row.createdAt.toISOString(),
    deactivatedAt: row.deactivatedAt?.toISOString() ?? null,
    invitationExpiresAt: row.invitationPending && row.invitationExpiresAt ? new Date(row.invitationExpiresAt).toISOString() : null,
  }));
}

async function rolesOf(db: Queryable, ids: string[]): Promise<Map<string, RoleName[]>> {
  const roles = new Map<string, RoleName[]>();
  if (ids.length === 0) return roles;
  const rows = await db.select({ userId: roleGrants.userId, role: roleGrants.role }).from(roleGrants).where(inArray(roleGrants.userId, ids));
  for (const row of rows) roles.set(row.userId, [...(roles.get(row.userId) ?? []), row.role]);
  for (const list of roles.values()) list.sort(byRoleOrder);
  return roles;
}

export type PersonState = {
  id: string; email: string; name: string; tenantId: string | null; roles: RoleName[];
  invitationPending: boolean; deactivatedAt: Date | null;
};

/** The user's row and roles, locked for update inside the caller's transaction; null when unknown. */
export async function lockPerson(db: Queryable, id: string): Promise<PersonState | null> {
  const [row] = await db.select({
    id: users.id, email: users.email, name: users.name, tenantId: users.tenantId,
    invitationPending: users.invitationPending, deactivatedAt: users.deactivatedAt,
  }).from(users).where(eq(users.id, id)).for('update');
  if (!row) return null;
  return { ...row, roles: (await rolesOf(db, [id])).get(id) ?? [] };
}

/** Admins who can sign in (not deactivated, invitation accepted), leaving out `exceptId`. */
export async function countActiveAdmins(db: Queryable, { exceptId }: { exceptId: string }): Promise<number> {
  const [row] = await db.select({ n: count() }).from(users)
    .innerJoin(roleGrants, and(eq(roleGrants.userId, users.id), eq(roleGrants.role, 'admin')))
    .where(and(isNull(users.deactivatedAt), eq(users.invitationPending, false), sql`${users.id} <> ${exceptId}`));
  return row?.n ?? 0;
}

/** The tenant's name; null when there is no such tenant. */
export async function getTenantName(db: Queryable, id: string): Promise<string | null> {
  const [row] = await db.select({ name: tenants.name }).from(tenants).where(eq(tenants.id, id)).limit(1);
  return row?.name ?? null;
}

/** The user with this e-mail (matched case-insensitively, as sign-in does), or null. */
export async function findUserIdByEmail(db: Queryable, email: string): Promise<string | null> {
  const [row] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${email.trim().toLowerCase()}`).limit(1);
  return row?.id ?? null;
}

/** Ends every session of the user at once; the number ended. */
export async function deleteSessionsOf(db: Queryable, userId: string): Promise<number> {
  return (await db.delete(sessions).where(eq(sessions.userId, userId)).returning({ id: sessions.id })).length;
}

/** A new user waiting for its invitation to be accepted: no password yet, roles granted. Returns its id. */
export async function insertInvitedUser(
  db: Queryable, p: { email: string; name: string; roles: RoleName[]; tenantId: string | null; now: Date },
): Promise<string> {
  const id = `user-${randomUUID()}`;
  await db.insert(users).values({ id, email: p.email.trim(), name: p.name, tenantId: p.tenantId, invitationPending: true, createdAt: p.now });
  await db.insert(roleGrants).values(p.roles.map((role) => ({ userId: id, role, grantedAt: p.now })));
  return id;
}

/** Replaces the user's roles and tenant. */
export async function replaceRoles(db: Queryable, p: { id: string; roles: RoleName[]; tenantId: string | null; now: Date }): Promise<void> {
  await db.update(users).set({ tenantId: p.tenantId }).where(eq(users.id, p.id));
  await db.delete(roleGrants).where(eq(roleGrants.userId, p.id));
  await db.insert(roleGrants).values(p.roles.map((role) => ({ userId: p.id, role, grantedAt: p.now })));
}

/** Sets (a date) or clears (null) the user's deactivation. */
export async function setDeactivatedAt(db: Queryable, { id, at }: { id: string; at: Date | null }): Promise<void> {
  await db.update(users).set({ deactivatedAt: at }).where(eq(users.id, id));
}

/** The invitee chose a password: store its hash and end the waiting state. */
export async function completeInvitedUser(db: Queryable, { id, passwordHash, now }: { id: string; passwordHash: string; now: Date }): Promise<void> {
  await db.insert(passwordCredentials).values({ userId: id, passwordHash, updatedAt: now })
    .onConflictDoUpdate({ target: passwordCredentials.userId, set: { passwordHash, updatedAt: now } });
  await db.update(users).set({ invitationPending: false }).where(eq(users.id, id));
}

/** Removes an invited user that never joined (its roles and links go with it; audit rows stay). */
export async function deleteInvitedUser(db: Queryable, id: string): Promise<void> {
  await db.delete(users).where(and(eq(users.id, id), eq(users.invitationPending, true)));
}
