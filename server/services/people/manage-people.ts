// Roles, deactivation and reactivation of a person, each in one transaction with its audit row. The last active
// admin keeps the admin role and stays active, so someone can always manage people.
import type { Tx } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { Person, PeopleFilter, RoleAssignment } from '../../../shared/people';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import {
  countActiveAdmins, deleteSessionsOf, getTenantName, listPeople, lockPerson, replaceRoles, setDeactivatedAt, type PersonState,
} from '../../queries/auth/users-people';
import { lockForTransaction } from '../../queries/locks/advisory-locks';
import { PEOPLE_LOCK_KEY, type PeopleDeps } from './deps';
import {
  AlreadyDeactivatedError, InvitedPersonError, LastAdminError, NotDeactivatedError, PersonNotFoundError, UnknownTenantError,
} from './errors';

type Deps = Pick<PeopleDeps, 'db' | 'now'>;

export function findPeople(deps: Deps, filter: PeopleFilter): Promise<Person[]> {
  return listPeople(deps.db, filter, deps.now);
}

async function readBack(deps: Deps, id: string): Promise<Person> {
  const [person] = await listPeople(deps.db, { ids: [id] }, deps.now);
  if (!person) throw new PersonNotFoundError();
  return person;
}

async function lockExisting(tx: Tx, id: string): Promise<PersonState> {
  await lockForTransaction(tx, PEOPLE_LOCK_KEY);
  const person = await lockPerson(tx, id);
  if (!person) throw new PersonNotFoundError();
  return person;
}

/** True when `person` is an admin who can sign in and nobody else is. */
async function isLastActiveAdmin(tx: Tx, person: PersonState): Promise<boolean> {
  const activeAdmin = person.roles.includes('admin') && !person.deactivatedAt && !person.invitationPending;
  return activeAdmin && (await countActiveAdmins(tx, { exceptId: person.id })) === 0;
}

const sameSet = (a: readonly string[], b: readonly string[]) => a.length === b.length && a.every((x) => b.includes(x));

export async function setRoles(deps: Deps, actor: Me, id: string, next: RoleAssignment): Promise<Person> {
  const { now } = deps;
  await deps.db.transaction(async (tx) => {
    const person = await lockExisting(tx, id);
    if (next.tenantId && (await getTenantName(tx, next.tenantId)) === null) throw new UnknownTenantError();
    if (!next.roles.includes('admin') && (await isLastActiveAdmin(tx, person))) throw new LastAdminError('demote');
    if (sameSet(person.roles, next.roles) && person.tenantId === next.tenantId) return;
    await replaceRoles(tx, { id, roles: next.roles, tenantId: next.tenantId, now });
    await insertAuditEntry(tx, {
      actorId: actor.id, action: 'user.roles', entity: 'user', entityId: id, at: now,
      before: { roles: person.roles, tenantId: person.tenantId }, after: { roles: next.roles, tenantId: next.tenantId },
    });
  });
  return readBack(deps, id);
}

/** Deactivates the account and ends every session it has at once; its history stays. */
export async function deactivatePerson(deps: Deps, actor: Me, id: string): Promise<Person> {
  const { now } = deps;
  await deps.db.transaction(async (tx) => {
    const person = await lockExisting(tx, id);
    if (person.deactivatedAt) throw new AlreadyDeactivatedError();
    if (person.invitationPending) throw new InvitedPersonError();
    if (await isLastActiveAdmin(tx, person)) throw new LastAdminError('deactivate');
    await setDeactivatedAt(tx, { id, at: now });
    const sessionsEnded = await deleteSessionsOf(tx, id);
    await insertAuditEntry(tx, {
      actorId: actor.id, action: 'user.deactivate', entity: 'user', entityId: id, at: now,
      before: { deactivatedAt: null }, after: { deactivatedAt: now.toISOString(), sessionsEnded },
    });
  });
  return readBack(deps, id);
}

export async function reactivatePerson(deps: Deps, actor: Me, id: string): Promise<Person> {
  const { now } = deps;
  await deps.db.transaction(async (tx) => {
    const person = await lockExisting(tx, id);
    if (!person.deactivatedAt) throw new NotDeactivatedError();
    await setDeactivatedAt(tx, { id, at: null });
    await insertAuditEntry(tx, {
      actorId: actor.id, action: 'user.reactivate', entity: 'user', entityId: id, at: now,
      before: { deactivatedAt: person.deactivatedAt.toISOString() }, after: { deactivatedAt: null },
    });
  });
  return readBack(deps, id);
}
