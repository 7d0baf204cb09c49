// The one-time set-up link: check it, and turn it into the first admin account and a session, in one transaction.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { NewAdmin } from '../../../shared/setup';
import { hashPassword } from '../../auth/password';
import { createSession } from '../../auth/sessions';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { getUserById } from '../../queries/auth/users';
import { lockForTransaction } from '../../queries/locks/advisory-locks';
import {
  countAdmins, findUsableSetUpLink, findUserByEmail, hashLinkToken, insertAdminAccount, markLinkUsed,
} from '../../queries/setup/set-up-links';
import { AlreadySetUpError, EmailInUseError, SetUpLinkInvalidError } from './errors';

/** Serialises set-ups: two people holding the link at once cannot both become the first admin. */
const SET_UP_LOCK_KEY = 7_118_304;

export async function checkSetUpLink(db: Db, { token, now }: { token: string; now: Date }): Promise<void> {
  if (!(await findUsableSetUpLink(db, { tokenHash: hashLinkToken(token), now }))) throw new SetUpLinkInvalidError();
}

export type SetUpInput = NewAdmin & { token: string; now: Date; userAgent: string | null; address: string | null };

/** Creates the admin, marks the link used and opens a session; refuses when any admin exists already. */
export async function completeSetUp(db: Db, input: SetUpInput): Promise<{ token: string; sessionId: string; user: Me }> {
  const { now } = input;
  // Hashing takes a while; done before the transaction so its locks are held briefly.
  const passwordHash = await hashPassword(input.password);
  const { userId, session } = await db.transaction(async (tx) => {
    await lockForTransaction(tx, SET_UP_LOCK_KEY);
    if ((await countAdmins(tx)) > 0) throw new AlreadySetUpError();
    const linkId = await findUsableSetUpLink(tx, { tokenHash: hashLinkToken(input.token), now, lock: true });
    if (!linkId) throw new SetUpLinkInvalidError();
    if (await findUserByEmail(tx, input.email)) throw new EmailInUseError();
    const id = await insertAdminAccount(tx, { email: input.email, name: input.name, passwordHash, now });
    await markLinkUsed(tx, { id: linkId, now, userId: id });
    await insertAuditEntry(tx, {
      actorId: id, action: 'set-up.first-admin', entity: 'user', entityId: id, at: now, after: { email: input.email, role: 'admin' },
    });
    // The session row commits with the account: the person lands signed in, or nothing happened at all.
    const opened = await createSession(tx as unknown as Db, { userId: id, now, userAgent: input.userAgent, address: input.address });
    return { userId: id, session: opened };
  });
  const user = await getUserById(db, { id: userId });
  if (!user) throw new Error('the new admin account could not be read back');
  return { ...session, user };
}
