// Session rows: created at sign-in, read on every request, touched at most hourly, deleted at sign-out.
import { and, asc, eq } from 'drizzle-orm';
import type { Db } from '../../../db/client';
import { sessions } from '../../../db/schema';

export type SessionRow = { id: string; userId: string; secretHash: string; createdAt: Date; lastActiveAt: Date };
export type SessionListRow = {
  id: string; createdAt: Date; lastActiveAt: Date; userAgent: string | null; address: string | null;
};

export async function insertSession(
  db: Db,
  { id, secretHash, userId, now, userAgent = null, address = null }:
    { id: string; secretHash: string; userId: string; now: Date; userAgent?: string | null; address?: string | null },
): Promise<void> {
  await db.insert(sessions).values({ id, secretHash, userId, createdAt: now, lastActiveAt: now, userAgent, address });
}

export async function getSessionById(db: Db, { id }: { id: string }): Promise<SessionRow | null> {
  const rows = await db
    .select({
      id: sessions.id, userId: sessions.userId, secretHash: sessions.secretHash,
      createdAt: sessions.createdAt, lastActiveAt: sessions.lastActiveAt,
    })
    .from(sessions)
    .where(eq(sessions.id, id))
    .limit(1);
  return rows[0] ?? null;
}

/** The user's sessions, oldest first; no secret hashes. */
export async function listSessionsOfUser(db: Db, { userId }: { userId: string }): Promise<SessionListRow[]> {
  return db
    .select({
      id: sessions.id, createdAt: sessions.createdAt, lastActiveAt: sessions.lastActiveAt,
      userAgent: sessions.userAgent, address: sessions.address,
    })
    .from(sessions)
    .where(eq(sessions.userId, userId))
    .orderBy(asc(sessions.createdAt), asc(sessions.id));
}

export async function touchSession(db: Db, { id, lastActiveAt }: { id: string; lastActiveAt: Date }): Promise<void> {
  await db.update(sessions).set({ lastActiveAt }).where(eq(sessions.id, id));
}

export async function deleteSession(db: Db, { id }: { id: string }): Promise<void> {
  await db.delete(sessions).where(eq(sessions.id, id));
}

/** Deletes the session only when it belongs to `userId`; true when a row went. */
export async function deleteSessionOfUser(db: Db, { id, userId }: { id: string; userId: string }): Promise<boolean> {
  const rows = await db.delete(sessions).where(and(eq(sessions.id, id), eq(sessions.userId, userId))).returning({ id: sessions.id });
  return rows.length > 0;
}

/** Deletes every session of the user; the number deleted. */
export async function deleteSessionsOfUser(db: Db, { userId }: { userId: string }): Promise<number> {
  const rows = await db.delete(sessions).where(eq(sessions.userId, userId)).returning({ id: sessions.id });
  return rows.length;
}
