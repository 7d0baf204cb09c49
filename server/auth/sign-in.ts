// Sign-in and sign-out as services: check the limits and the password, open or close a session, write the audit row.
import type { Db } from '../../db/client';
import type { Me } from '../../shared/api';
import { BadCredentialsError } from '../errors';
import { AccountDeactivatedError } from './account-deactivated-error';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { getUserById, getUserCredentialsByEmail } from '../queries/auth/users';
import { verifyDummyPassword, verifyPassword } from './password';
import { createSession, invalidateSession } from './sessions';
import { assertPasswordSignInAllowed } from './sso/settings';
import { displayAddress } from './user-agent-label';
import { releaseSignInAttempt, reserveSignInAttempt, signInKeys, type SignInLimit } from './sign-in-limit';

export type SignInInput = {
  email: string;
  password: string;
  now: Date;
  /** the client address (req.ip) the per-address limit counts under */
  address?: string;
  /** a short label of the browser, kept with the session */
  userAgent?: string | null;
  limit: SignInLimit;
};

export async function signIn(db: Db, input: SignInInput): Promise<{ token: string; sessionId: string; user: Me }> {
  const { email, password, now } = input;
  // Before the password check: a limited attempt costs no hashing and learns nothing about the password.
  const reservation = await reserveSignInAttempt(db, { keys: signInKeys(email, input.address), limit: input.limit, now });
  const credentials = await getUserCredentialsByEmail(db, { email });
  const passwordOk = credentials
    ? await verifyPassword(credentials.passwordHash, password)
    : await verifyDummyPassword(password);
  if (credentials && passwordOk && credentials.deactivatedAt) {
    await insertAuditEntry(db, { actorId: credentials.id, action: 'sign-in-refused-deactivated', entity: 'user', entityId: credentials.id, at: now });
    throw new AccountDeactivatedError();
  }
  const user = credentials && passwordOk ? await getUserById(db, { id: credentials.id }) : null;
  if (!user) {
    // Failed attempts are recorded too: the trail of guessing matters more than the noise.
    await insertAuditEntry(db, {
      actorId: credentials?.id ?? null, action: 'sign-in-failed', entity: 'user', entityId: credentials?.id ?? null,
      after: { email: email.trim().toLowerCase() }, at: now,
    });
    throw new BadCredentialsError();
  }
  await releaseSignInAttempt(db, reservation);
  // After the password check, so a refusal tells only someone who knows the password that it is turned off.
  await assertPasswordSignInAllowed(db, user, now);
  const { token, sessionId } = await createSession(db, {
    userId: user.id, now, userAgent: input.userAgent ?? null, address: displayAddress(input.address),
  });
  await insertAuditEntry(db, { actorId: user.id, action: 'sign-in', entity: 'session', entityId: sessionId, at: now });
  return { token, sessionId, user };
}

export async function signOut(db: Db, { sessionId, userId, now }: { sessionId: string; userId: string; now: Date }): Promise<void> {
  await invalidateSession(db, { sessionId });
  await insertAuditEntry(db, { actorId: userId, action: 'sign-out', entity: 'session', entityId: sessionId, at: now });
}
