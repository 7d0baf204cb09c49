// The signed-in user's own sessions: list them, end one by its handle, or end all of them ("sign out everywhere").
import type { Db } from '../../db/client';
import type { SessionInfo } from '../../shared/sessions';
import { domainError } from '../errors';
import { insertAuditEntry } from '../queries/audit/audit-log';
import { deleteSessionOfUser, deleteSessionsOfUser, listSessionsOfUser } from '../queries/auth/sessions';
import { sessionExpiresAt, type SessionLifetime } from './sessions';
import { sessionHandle } from './session-token';

export class SessionNotFoundError extends domainError('SESSION_NOT_FOUND', 404,
  () => 'No session of yours has this id; it may have ended already.') {}

type Owner = { userId: string; currentSessionId: string };

/** Only sessions still alive at `now`; an expired row is simply not shown (the next use deletes it). */
export async function listOwnSessions(
  db: Db,
  { userId, currentSessionId, now, lifetime }: Owner & { now: Date; lifetime: SessionLifetime },
): Promise<SessionInfo[]> {
  const rows = await listSessionsOfUser(db, { userId });
  return rows
    .map((row) => ({ row, expiresAt: sessionExpiresAt(row, lifetime) }))
    .filter(({ expiresAt }) => expiresAt.getTime() > now.getTime())
    .map(({ row, expiresAt }) => ({
      id: sessionHandle(row.id),
      createdAt: row.createdAt.toISOString(),
      lastActiveAt: row.lastActiveAt.toISOString(),
      expiresAt: expiresAt.toISOString(),
      current: row.id === currentSessionId,
      userAgent: row.userAgent,
      address: row.address,
    }));
}

/** Ends one of the user's own sessions; another user's handle (or an unknown one) is SESSION_NOT_FOUND. */
export async function endOwnSession(
  db: Db,
  { userId, currentSessionId, handle, now }: Owner & { handle: string; now: Date },
): Promise<{ wasCurrent: boolean }> {
  const rows = await listSessionsOfUser(db, { userId });
  const match = rows.find((row) => sessionHandle(row.id) === handle);
  if (!match || !(await deleteSessionOfUser(db, { id: match.id, userId }))) throw new SessionNotFoundError();
  await insertAuditEntry(db, { actorId: userId, action: 'session-ended', entity: 'session', entityId: match.id, at: now });
  return { wasCurrent: match.id === currentSessionId };
}

/** Ends every session of the user, the current one included; the number ended. */
export async function endAllOwnSessions(db: Db, { userId, now }: { userId: string; now: Date }): Promise<number> {
  const ended = await deleteSessionsOfUser(db, { userId });
  await insertAuditEntry(db, { actorId: userId, action: 'sign-out-everywhere', entity: 'user', entityId: userId, at: now, after: { ended } });
  return ended;
}
