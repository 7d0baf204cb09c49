// Invitations: invite by e-mail (a waiting account and a one-time link, mailed through the queue), send the link
// again (the old one stops), revoke. Each change commits with its audit row; the mail is queued after the commit.
import type { Tx } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { INVITATION_VALID_HOURS, type Invitation } from '../../../shared/people';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { deleteOpenInviteLinks, hashLinkToken, insertInviteLink, newLinkToken } from '../../queries/auth/invitation-links';
import { deleteInvitedUser, findUserIdByEmail, getTenantName, insertInvitedUser, lockPerson, type PersonState } from '../../queries/auth/users-people';
import { lockForTransaction } from '../../queries/locks/advisory-locks';
import { PEOPLE_LOCK_KEY, type PeopleDeps } from './deps';
import { InvitationNotFoundError, PersonEmailInUseError, UnknownTenantError } from './errors';
import { invitationMail } from './invitation-mail';

export type NewInvitation = { email: string; name: string; roles: Me['roles']; tenantId: string | null };

const VALID_MS = INVITATION_VALID_HOURS * 60 * 60 * 1000;

const utcText = (at: Date) => `${new Intl.DateTimeFormat('en-GB', {
  timeZone: 'UTC', weekday: 'short', day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23',
}).format(at)} UTC`;

type Issued = { person: PersonState; token: string; expiresAt: Date; tenantName: string | null };

/** A fresh link for `person` (their open ones removed first); the token to mail. */
async function issueLink(tx: Tx, person: PersonState, now: Date): Promise<{ token: string; expiresAt: Date }> {
  const token = newLinkToken();
  const expiresAt = new Date(now.getTime() + VALID_MS);
  await deleteOpenInviteLinks(tx, person.id);
  await insertInviteLink(tx, { userId: person.id, email: person.email, tokenHash: hashLinkToken(token), now, expiresAt });
  return { token, expiresAt };
}

async function mailAndAnswer(deps: PeopleDeps, actor: Me, issued: Issued): Promise<Invitation> {
  const { person, token, expiresAt, tenantName } = issued;
  let mailQueued = true;
  try {
    await deps.jobs.sendMail(invitationMail({
      publicUrl: deps.publicUrl, to: person.email, name: person.name, inviterName: actor.name, roles: person.roles, tenantName, token,
      expiresText: utcText(expiresAt),
    }));
  } catch (err) {
    // The invitation stands; the admin sees that the mail is not on its way and sends it again.
    mailQueued = false;
    deps.log?.('the invitation mail could not be queued', err);
  }
  return {
    id: person.id, email: person.email, name: person.name, roles: person.roles, tenantId: person.tenantId,
    expiresAt: expiresAt.toISOString(), mailQueued,
  };
}

export async function createInvitation(deps: PeopleDeps, actor: Me, input: NewInvitation): Promise<Invitation> {
  const { now } = deps;
  const issued = await deps.db.transaction(async (tx): Promise<Issued> => {
    await lockForTransaction(tx, PEOPLE_LOCK_KEY);
    const tenantName = input.tenantId ? await getTenantName(tx, input.tenantId) : null;
    if (input.tenantId && tenantName === null) throw new UnknownTenantError();
    if (await findUserIdByEmail(tx, input.email)) throw new PersonEmailInUseError();
    const id = await insertInvitedUser(tx, { ...input, now });
    const person = await lockPerson(tx, id);
    if (!person) throw new Error('the invited account could not be read back');
    const { token, expiresAt } = await issueLink(tx, person, now);
    await insertAuditEntry(tx, {
      actorId: actor.id, action: 'invitation.create', entity: 'user', entityId: id, at: now,
      after: { email: person.email, name: person.name, roles: person.roles, tenantId: person.tenantId, expiresAt: expiresAt.toISOString() },
    });
    return { person, token, expiresAt, tenantName };
  });
  return mailAndAnswer(deps, actor, issued);
}

async function lockInvited(tx: Tx, id: string): Promise<PersonState> {
  const person = await lockPerson(tx, id);
  if (!person || !person.invitationPending || person.deactivatedAt) throw new InvitationNotFoundError();
  return person;
}

/** A new link for an invited person; the one sent before stops working. */
export async function resendInvitation(deps: PeopleDeps, actor: Me, id: string): Promise<Invitation> {
  const { now } = deps;
  const issued = await deps.db.transaction(async (tx): Promise<Issued> => {
    await lockForTransaction(tx, PEOPLE_LOCK_KEY);
    const person = await lockInvited(tx, id);
    const { token, expiresAt } = await issueLink(tx, person, now);
    await insertAuditEntry(tx, {
      actorId: actor.id, action: 'invitation.resend', entity: 'user', entityId: id, at: now, after: { expiresAt: expiresAt.toISOString() },
    });
    return { person, token, expiresAt, tenantName: person.tenantId ? await getTenantName(tx, person.tenantId) : null };
  });
  return mailAndAnswer(deps, actor, issued);
}

/** Withdraws an invitation: its link stops working and the waiting account goes (the audit rows keep the trail). */
export async function revokeInvitation(deps: PeopleDeps, actor: Me, id: string): Promise<void> {
  const { now } = deps;
  await deps.db.transaction(async (tx) => {
    await lockForTransaction(tx, PEOPLE_LOCK_KEY);
    const person = await lockInvited(tx, id);
    await deleteInvitedUser(tx, id);
    await insertAuditEntry(tx, {
      actorId: actor.id, action: 'invitation.revoke', entity: 'user', entityId: id, at: now,
      before: { email: person.email, name: person.name, roles: person.roles, tenantId: person.tenantId },
    });
  });
}
