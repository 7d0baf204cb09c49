// The user's subscription address: made on first request, shown again on later ones, replaced by revoking it.
// Making and revoking are audited (never with the token: the audit log is read by admins).
import type { Db } from '../../../db/client';
import type { CalendarFeed } from '../../../shared/calendar-feeds';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { deleteFeedOfUser, insertFeedIfNone, selectFeedOfUser } from '../../queries/feeds/calendar-feeds';
import { hashFeedToken, newFeedToken } from './feed-token';

export function feedUrl(publicUrl: string, token: string): string {
  return `${publicUrl}/api/calendar-feeds/${token}.ics`;
}

/** The user's address, made now when the user has none. */
export async function getOrCreateFeed(db: Db, userId: string, now: Date, publicUrl: string): Promise<CalendarFeed> {
  const row = await db.transaction(async (tx) => {
    const existing = await selectFeedOfUser(tx, { userId });
    if (existing) return existing;
    const token = newFeedToken();
    await insertFeedIfNone(tx, { userId, token, tokenHash: hashFeedToken(token), createdAt: now });
    const made = await selectFeedOfUser(tx, { userId });
    if (made?.token === token) {
      await insertAuditEntry(tx, { actorId: userId, action: 'calendar-feed.create', entity: 'user', entityId: userId, at: now });
    }
    return made;
  });
  if (!row) throw new Error('The calendar feed was not stored.');
  return { url: feedUrl(publicUrl, row.token), createdAt: row.createdAt.toISOString() };
}

/** Ends the user's address at once; the next request for it makes a new one. */
export async function revokeFeed(db: Db, userId: string, now: Date): Promise<boolean> {
  return db.transaction(async (tx) => {
    const removed = await deleteFeedOfUser(tx, { userId });
    if (removed) await insertAuditEntry(tx, { actorId: userId, action: 'calendar-feed.revoke', entity: 'user', entityId: userId, at: now });
    return removed;
  });
}
