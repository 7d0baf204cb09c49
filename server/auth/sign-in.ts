// Sign-in and sign-out as services: check the password, open or close a session, write the audit row.
import type { Db } from '../../db/client';
import type { Me } from '../../shared/api';
import { BadCredentialsError } from '../errors';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { getUserById, getUserCredentialsByEmail } from '../queries/auth/users';
import { verifyDummyPassword, verifyPassword } from './password';
import { createSession, invalidateSession } from './sessions';

export async function signIn(
  db: Db,
  { email, password, now }: { email: string; password: string; now: Date },
): Promise<{ token: string; sessionId: string; user: Me }> {
  const credentials = await getUserCredentialsByEmail(db, { email });
  const passwordOk = credentials
    ? await verifyPassword(credentials.passwordHash, password)
    : await verifyDummyPassword(password);
  const user = credentials && passwordOk ? await getUserById(db, { id: credentials.id }) : null;
  if (!user) {
    // Failed attempts are recorded too: the trail of guessing matters more than the noise.
    await insertAuditEntry(db, {
      actorId: credentials?.id ?? null, action: 'sign-in-failed', entity: 'user', entityId: credentials?.id ?? null,
      after: { email: email.trim().toLowerCase() }, at: now,
    });
    throw new BadCredentialsError();
  }
  const { token, sessionId } = await createSession(db, { userId: user.id, now });
  await insertAuditEntry(db, { actorId: user.id, action: 'sign-in', entity: 'session', entityId: sessionId, at: now });
  return { token, sessionId, user };
}

export async function signOut(db: Db, { sessionId, userId, now }: { sessionId: string; userId: string; now: Date }): Promise<void> {
  await invalidateSession(db, { sessionId });
  await insertAuditEntry(db, { actorId: userId, action: 'sign-out', entity: 'session', entityId: sessionId, at: now });
}
