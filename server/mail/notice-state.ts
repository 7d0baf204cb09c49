// A notice's sending state as the mail worker sees it: which version is committed, sent, an attempt failed,
// or given up on. Every update names the version (sequence) it is about, so a late job of a superseded
// version never overwrites the state of the current one.
import { and, eq, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { notices } from '../../db/schema';

/**
 * `send`: the notice holds this version, committed. `wait`: not visible yet (the transaction that queued it
 * has not committed, or rolled back); the job is retried and, if it never appears, nothing is sent.
 * `superseded`: a newer version replaced it; this mail must not go out.
 */
export async function noticeVersionState(db: Db, noticeId: string, sequence: number | undefined): Promise<'send' | 'wait' | 'superseded'> {
  const [row] = await db.select({ sequence: notices.sequence }).from(notices).where(eq(notices.id, noticeId));
  if (!row) return 'wait';
  if (sequence === undefined || row.sequence === sequence) return 'send';
  return row.sequence > sequence ? 'superseded' : 'wait';
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
