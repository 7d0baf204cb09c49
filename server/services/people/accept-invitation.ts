// The invitee's side: does the link work, and accept it with a password (which signs them in), in one transaction.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { InvitationLink } from '../../../shared/people';
import { hashPassword } from '../../auth/password';
import { assertPasswordAcceptable } from '../../auth/password-policy';
import { createSession } from '../../auth/sessions';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { findUsableInviteLink, hashLinkToken, markInviteLinkUsed } from '../../queries/auth/invitation-links';
import { getUserById } from '../../queries/auth/users';
import { completeInvitedUser } from '../../queries/auth/users-people';
import { InvitationLinkInvalidError } from './errors';

export async function checkInvitationLink(db: Db, { token, now }: { token: string; now: Date }): Promise<InvitationLink> {
  const link = await findUsableInviteLink(db, { tokenHash: hashLinkToken(token), now });
  if (!link) throw new InvitationLinkInvalidError();
  // Staff may take single sign-on instead of a password; tenant users never sign in through it.
  return { email: link.email, name: link.name, staff: link.tenantId === null };
}

export type AcceptInput = { token: string; password: string; now: Date; userAgent: string | null; address: string | null };

/** Sets the password, uses up the link and opens a session; a second use of the same link is refused. */
export async function acceptInvitation(db: Db, input: AcceptInput): Promise<{ token: string; sessionId: string; user: Me }> {
  const { now } = input;
  const tokenHash = hashLinkToken(input.token);
  const invitee = await findUsableInviteLink(db, { tokenHash, now });
  if (!invitee) throw new InvitationLinkInvalidError();
  // The shared policy: long enough and not easy to guess, the invitee's own name and address counted as weak.
  assertPasswordAcceptable(input.password, invitee);
  // Hashing takes a while; done before the transaction so its locks are held briefly.
  const passwordHash = await hashPassword(input.password);
  const { userId, session } = await db.transaction(async (tx) => {
    const link = await findUsableInviteLink(tx, { tokenHash, now, lock: true });
    if (!link) throw new InvitationLinkInvalidError();
    await completeInvitedUser(tx, { id: link.userId, passwordHash, now });
    await markInviteLinkUsed(tx, { id: link.id, now });
    await insertAuditEntry(tx, { actorId: link.userId, action: 'invitation.accept', entity: 'user', entityId: link.userId, at: now });
    // The session commits with the password: the person lands signed in, or nothing happened at all.
    const opened = await createSession(tx as unknown as Db, { userId: link.userId, now, userAgent: input.userAgent, address: input.address });
    return { userId: link.userId, session: opened };
  });
  const user = await getUserById(db, { id: userId });
  if (!user) throw new Error('the new account could not be read back');
  return { ...session, user };
}
