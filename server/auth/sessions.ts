// Session life cycle: create at sign-in, validate per request (inactivity expiry), invalidate at sign-out.
import type { Db } from '../../db/client';
import type { Me } from '../../shared/api';
import { deleteSession, getSessionById, insertSession, touchSession } from '../queries/auth/sessions';
import { getUserById } from '../queries/auth/users';
import type { SessionAuth } from './request-auth';
import { generateSessionToken, parseSessionToken, secretMatches } from './session-token';

/** lastActiveAt is written at most this often, so a busy user costs no write per request. */
export const SESSION_REFRESH_MS = 60 * 60 * 1000;

export async function createSession(
  db: Db,
  { userId, now }: { userId: string; now: Date },
): Promise<{ sessionId: string; token: string }> {
  const { id, token, secretHash } = generateSessionToken();
  await insertSession(db, { id, secretHash, userId, now });
  return { sessionId: id, token };
}

/** The session and its user, or null for any bad, unknown, tampered or expired token. */
export async function validateSessionToken(
  db: Db,
  token: string,
  { now, inactivitySeconds }: { now: Date; inactivitySeconds: number },
): Promise<SessionAuth | null> {
  const parsed = parseSessionToken(token);
  if (!parsed) return null;
  const session = await getSessionById(db, { id: parsed.id });
  if (!session || !secretMatches(parsed.secret, session.secretHash)) return null;
  const idleMs = now.getTime() - session.lastActiveAt.getTime();
  if (idleMs >= inactivitySeconds * 1000) {
    await deleteSession(db, { id: session.id });
    return null;
  }
  const user = await getUserById(db, { id: session.userId });
  if (!user) return null;
  const refreshed = idleMs >= SESSION_REFRESH_MS;
  if (refreshed) await touchSession(db, { id: session.id, lastActiveAt: now });
  return { sessionId: session.id, user, lastActiveAt: refreshed ? now : session.lastActiveAt, refreshed };
}

export async function invalidateSession(db: Db, { sessionId }: { sessionId: string }): Promise<void> {
  await deleteSession(db, { id: sessionId });
}

/** What leaves the server about a session: the user's public fields, never ids or hashes of the session. */
export function toPublicSession(auth: { user: Me }): { user: Me } {
  const { id, email, name, roles, tenantId } = auth.user;
  return { user: { id, email, name, roles: [...roles], tenantId } };
}
