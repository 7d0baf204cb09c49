// Rows of `calendar_feeds`: one subscription address per user, found by the hash of its token.
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { calendarFeeds } from '../../../db/schema';

export type CalendarFeedRow = typeof calendarFeeds.$inferSelect;

export async function selectFeedOfUser(db: Queryable, { userId }: { userId: string }): Promise<CalendarFeedRow | null> {
  const [row] = await db.select().from(calendarFeeds).where(eq(calendarFeeds.userId, userId));
  return row ?? null;
}

/** Adds the user's feed unless one exists already (two first requests at once keep one address). */
export async function insertFeedIfNone(db: Queryable, row: CalendarFeedRow): Promise<void> {
  await db.insert(calendarFeeds).values(row).onConflictDoNothing({ target: calendarFeeds.userId });
}

/** Removes the user's feed; true when there was one. */
export async function deleteFeedOfUser(db: Queryable, { userId }: { userId: string }): Promise<boolean> {
  const rows = await db.delete(calendarFeeds).where(eq(calendarFeeds.userId, userId)).returning({ userId: calendarFeeds.userId });
  return rows.length > 0;
}

/** The owner of the feed whose token hashes to `tokenHash`, or null. */
export async function selectFeedOwnerByTokenHash(db: Queryable, { tokenHash }: { tokenHash: string }): Promise<string | null> {
  const [row] = await db.select({ userId: calendarFeeds.userId }).from(calendarFeeds).where(eq(calendarFeeds.tokenHash, tokenHash));
  return row?.userId ?? null;
}
