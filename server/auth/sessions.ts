// Session life cycle: create at sign-in, validate per request (inactivity and absolute expiry), invalidate at sign-out.
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
  { userId, now, userAgent = null, address = null }:
    { userId: string; now: Date; userAgent?: string | null; address?: string | null },
): Promise<{ sessionId: string; token: string }> {
  const { id, token, secretHash } = generateSessionToken();
  await insertSession(db, { id, secretHash, userId, now, userAgent, address });
  return { sessionId: id, token };
}

export type SessionLifetime = { inactivitySeconds: number; maxAgeSeconds: number };

/** When a session ends unless used again: idle expiry, capped by the absolute lifetime from sign-in. */
export function sessionExpiresAt(session: { createdAt: Date; lastActiveAt: Date }, lifetime: SessionLifetime): Date {
  const idleEndMs = session.lastActiveAt.getTime() + lifetime.inactivitySeconds * 1000;
  const absoluteEndMs = session.createdAt.getTime() + lifetime.maxAgeSeconds * 1000;
  return new Date(Math.min(idleEndMs, absoluteEndMs));
}

/** The session and its user, or null for any bad, unknown, tampered or expired token. */
export async function validateSessionToken(
  db: Db,
  token: string,
  { now, ...lifetime }: { now: Date } & SessionLifetime,
): Promise<SessionAuth | null> {
  const parsed = parseSessionToken(token);
  if (!parsed) return null;
  const session = await getSessionById(db, { id: parsed.id });
  if (!session || !secretMatches(parsed.secret, session.secretHash)) return null;
  const idleMs = now.getTime() - session.lastActiveAt.getTime();
  // WARNING: the absolute lifetime ends a session even while it is used, so a stolen cookie is not good forever.
  const ageMs = now.getTime() - session.createdAt.getTime();
  if (idleMs >= lifetime.inactivitySeconds * 1000 || ageMs >= lifetime.maxAgeSeconds * 1000) {
    await deleteSession(db, { id: session.id });
    return null;
  }
  const user = await getUserById(db, { id: session.userId });
  if (!user) return null;
  const refreshed = idleMs >= SESSION_REFRESH_MS;
  if (refreshed) await touchSession(db, { id: session.id, lastActiveAt: now });
  const lastActiveAt = refreshed ? now : session.lastActiveAt;
  const expiresAt = sessionExpiresAt({ createdAt: session.createdAt, lastActiveAt }, lifetime);
  return { sessionId: session.id, user, lastActiveAt, expiresAt, refreshed };
}

export async function invalidateSession(db: Db, { sessionId }: { sessionId: string }): Promise<void> {
  await deleteSession(db, { id: sessionId });
}

/** What leaves the server about a session: the user's public fields, never ids or hashes of the session. */
export function toPublicSession(auth: { user: Me }): { user: Me } {
  const { id, email, name, roles, tenantId, timeZone, timeZoneChosen } = auth.user;
  return { user: { id, email, name, roles: [...roles], tenantId, timeZone, timeZoneChosen } };
}
