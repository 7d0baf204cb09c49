// A notice's sending state as the mail worker sees it: sent, an attempt failed, or given up on.
import { eq, sql } from 'drizzle-orm';
import type { Db } from '../../db/client';
import { notices } from '../../db/schema';

export async function markNoticeSent(db: Db, noticeId: string, now: Date): Promise<void> {
  await db
    .update(notices)
    .set({ status: 'sent', sentAt: now, attempts: sql`${notices.attempts} + 1`, lastError: null, updatedAt: now })
    .where(eq(notices.id, noticeId));
}

/** Keeps the status (the queue will retry) and records why this attempt failed. */
export async function markNoticeAttemptFailed(db: Db, noticeId: string, error: string, now: Date): Promise<void> {
  await db
    .update(notices)
    .set({ attempts: sql`${notices.attempts} + 1`, lastError: error, updatedAt: now })
    .where(eq(notices.id, noticeId));
}

/** The queue's retries are used up. */
export async function markNoticeFailed(db: Db, noticeId: string, now: Date): Promise<void> {
  await db.update(notices).set({ status: 'failed', updatedAt: now }).where(eq(notices.id, noticeId));
}
