// Session rows: created at sign-in, read on every request, touched at most hourly, deleted on sign-out.
import { eq } from 'drizzle-orm';
import type { Db } from '../../../db/client';
import { sessions } from '../../../db/schema';

export type SessionRow = { id: string; userId: string; secretHash: string; lastActiveAt: Date };

export async function insertSession(
  db: Db,
  { id, secretHash, userId, now }: { id: string; secretHash: string; userId: string; now: Date },
): Promise<void> {
  await db.insert(sessions).values({ id, secretHash, userId, createdAt: now, lastActiveAt: now });
}

export async function getSessionById(db: Db, { id }: { id: string }): Promise<SessionRow | null> {
  const rows = await db
    .select({ id: sessions.id, userId: sessions.userId, secretHash: sessions.secretHash, lastActiveAt: sessions.lastActiveAt })
    .from(sessions)
    .where(eq(sessions.id, id))
    .limit(1);
  return rows[0] ?? null;
}

export async function touchSession(db: Db, { id, lastActiveAt }: { id: string; lastActiveAt: Date }): Promise<void> {
  await db.update(sessions).set({ lastActiveAt }).where(eq(sessions.id, id));
}

export async function deleteSession(db: Db, { id }: { id: string }): Promise<void> {
  await db.delete(sessions).where(eq(sessions.id, id));
}
