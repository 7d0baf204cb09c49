// Who a verified issuer account signs in as: the linked user, else a user with the same verified e-mail, else a
// new user; with the roles its groups map to, taken again at every sign-in (a group change is a role change).
import type { Db, Queryable } from '../../../db/client';
import type { RoleName } from '../../../shared/api';
import type { SsoGroupRoles } from '../../../shared/sso';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { countActiveAdmins } from '../../queries/auth/users-people';
import {
  clearInvitationPending, getUserByIdentity, getUserFactsByEmail, insertSsoUser, linkIdentity, replaceRoles, type SsoUserFacts,
} from '../../queries/sso/identities';
import { SsoSignInError } from './errors';

export type IssuerAccount = { issuer: string; subject: string; email: string | null; emailVerified: boolean; name: string | null; groups: string[] };

const ROLE_ORDER: RoleName[] = ['admin', 'engineer', 'planner', 'approver', 'tenant'];

/** The roles the account's groups give (staff roles only: the mapping cannot name `tenant`). */
export function rolesForGroups(groups: string[], mapping: SsoGroupRoles[]): RoleName[] {
  const roles = new Set<RoleName>(mapping.filter((m) => groups.includes(m.group)).flatMap((m) => m.roles));
  return ROLE_ORDER.filter((r) => roles.has(r));
}

/** The groups claim as a list of names: issuers send an array, a few a single string. */
export function groupsFromClaim(value: unknown): string[] {
  if (typeof value === 'string') return [value];
  return Array.isArray(value) ? value.filter((g): g is string => typeof g === 'string') : [];
}

const sameRoles = (a: RoleName[], b: RoleName[]) => a.length === b.length && a.every((r) => b.includes(r));

async function findOrCreate(tx: Queryable, account: IssuerAccount, roles: RoleName[], now: Date): Promise<SsoUserFacts & { created?: true }> {
  const linked = await getUserByIdentity(tx, account);
  if (linked) return linked;
  if (!account.email) throw new SsoSignInError('email');
  const existing = await getUserFactsByEmail(tx, account.email);
  // WARNING: an unverified address must not take over the account that owns it.
  if (existing && !account.emailVerified) throw new SsoSignInError('email', 'e-mail not verified by the issuer');
  if (existing) return existing;
  if (roles.length === 0) throw new SsoSignInError('no-access');
  const id = await insertSsoUser(tx, { email: account.email, name: account.name ?? account.email, now });
  await insertAuditEntry(tx, { actorId: id, action: 'sso-user-created', entity: 'user', entityId: id,
    after: { email: account.email, name: account.name ?? account.email, roles }, at: now });
  return { id, email: account.email, tenantId: null, deactivated: false, roles: [], created: true };
}

/** The user id to open a session for; throws SsoSignInError when the account may not sign in. */
export async function provisionSsoUser(db: Db, account: IssuerAccount, mapping: SsoGroupRoles[], now: Date): Promise<string> {
  const mapped = rolesForGroups(account.groups, mapping);
  const outcome = await db.transaction(async (tx) => {
    let roles = mapped;
    const user = await findOrCreate(tx, account, roles, now);
    if (user.tenantId !== null || user.roles.includes('tenant')) throw new SsoSignInError('tenant');
    if (user.deactivated) throw new SsoSignInError('deactivated');
    // The issuer's groups decide roles, except that they never take the admin role from the last active admin:
    // nobody would be left to manage people or these settings.
    if (user.roles.includes('admin') && !roles.includes('admin') && (await countActiveAdmins(tx, { exceptId: user.id })) === 0) {
      roles = ROLE_ORDER.filter((r) => r === 'admin' || roles.includes(r));
      await insertAuditEntry(tx, { actorId: user.id, action: 'sso-last-admin-kept', entity: 'user', entityId: user.id,
        after: { groups: account.groups }, at: now });
    }
    const linkedBefore = !user.created && (await getUserByIdentity(tx, account)) !== null;
    // A linked account whose groups no longer map loses its roles now, not at some later clean-up.
    if (roles.length === 0 && !linkedBefore) throw new SsoSignInError('no-access');
    if (!sameRoles(user.roles, roles)) {
      await replaceRoles(tx, { userId: user.id, roles, now });
      if (!user.created) {
        await insertAuditEntry(tx, { actorId: user.id, action: 'sso-roles-changed', entity: 'user', entityId: user.id,
          before: { roles: user.roles }, after: { roles, groups: account.groups }, at: now });
      }
    }
    if (roles.length === 0) return { refused: true as const };
    if (!linkedBefore && !user.created) {
      await insertAuditEntry(tx, { actorId: user.id, action: 'sso-identity-linked', entity: 'user', entityId: user.id,
        after: { issuer: account.issuer, email: account.email }, at: now });
    }
    await linkIdentity(tx, { issuer: account.issuer, subject: account.subject, userId: user.id, now });
    await clearInvitationPending(tx, user.id);
    return { refused: false as const, userId: user.id };
  });
  if (outcome.refused) throw new SsoSignInError('no-access');
  return outcome.userId;
}
