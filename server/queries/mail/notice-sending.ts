// A notice's sending state as the mail worker writes it. Every update names the version (sequence) it is
// about, so a late job of a superseded version never overwrites the state of the current one.
import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../../../db/client';
import { notices } from '../../../db/schema';

/** The committed version (sequence) of the notice and its sending status, or null while it is not visible. */
export async function selectNoticeSequence(db: Db, noticeId: string): Promise<{ sequence: number; status: string } | null> {
  const [row] = await db.select({ sequence: notices.sequence, status: notices.status }).from(notices).where(eq(notices.id, noticeId));
  return row ?? null;
}

const sameVersion = (noticeId: string, sequence: number | undefined) =>
  sequence === undefined ? eq(notices.id, noticeId) : and(eq(notices.id, noticeId), eq(notices.sequence, sequence));

export async function markNoticeSent(db: Db, noticeId: string, sequence: number | undefined, now: Date): Promise<void> {
  await db
    .update(notices)
    .set({ status: 'sent', sentAt: now, attempts: sql`${notices.attempts} + 1`, lastError: null, updatedAt: now })
    .where(sameVersion(noticeId, sequence));
}

/** Keeps the status (the queue will retry) and records why this attempt failed. */
export async function markNoticeAttemptFailed(db: Db, noticeId: string, sequence: number | undefined, error: string, now: Date): Promise<void> {
  await db
    .update(notices)
    .set({ attempts: sql`${notices.attempts} + 1`, lastError: error, updatedAt: now })
    .where(sameVersion(noticeId, sequence));
}

/** The queue's retries are used up. */
export async function markNoticeFailed(db: Db, noticeId: string, sequence: number | undefined, now: Date): Promise<void> {
  await db.update(notices).set({ status: 'failed', updatedAt: now }).where(sameVersion(noticeId, sequence));
}
