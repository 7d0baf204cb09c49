// Answers a feed address: finds its owner by the token's hash, reads the owner's roles as they are now (a user
// removed or left without roles has no feed any more), and builds the staff or the tenant calendar.
import type { Db } from '../../../db/client';
import { FEED_AHEAD_DAYS, FEED_PAST_DAYS } from '../../../shared/calendar-feeds';
import { isOperator, tenantScopeOf } from '../../../shared/permissions';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { getUserById } from '../../queries/auth/users';
import { selectFeedOwnerByTokenHash } from '../../queries/feeds/calendar-feeds';
import type { ServerConfig } from '../../env';
import { FeedNotFoundError } from './errors';
import { buildFeedCalendar } from './feed-calendar';
import { hashFeedToken, isFeedTokenShape } from './feed-token';
import { staffFeedEvents } from './staff-feed';
import { tenantFeedEvents } from './tenant-feed';

const DAY_MS = 86_400_000;

export function feedRange(now: Date): { from: Date; to: Date } {
  return { from: new Date(now.getTime() - FEED_PAST_DAYS * DAY_MS), to: new Date(now.getTime() + FEED_AHEAD_DAYS * DAY_MS) };
}

/** The iCalendar text behind `token`; FeedNotFoundError for anything that is not a live feed of a current user. */
export async function feedCalendar(db: Db, token: string, now: Date, config: ServerConfig): Promise<string> {
  if (!isFeedTokenShape(token)) throw new FeedNotFoundError();
  const userId = await selectFeedOwnerByTokenHash(db, { tokenHash: hashFeedToken(token) });
  const user = userId ? await getUserById(db, { id: userId }) : null;
  if (!user || user.roles.length === 0) throw new FeedNotFoundError();
  const range = feedRange(now);
  const scope = tenantScopeOf(user);
  if (scope === null && isOperator(user.roles)) {
    const events = await staffFeedEvents(db, range, { publicUrl: config.publicUrl, timeZone: user.timeZone ?? NETWORK_TIME_ZONE });
    return buildFeedCalendar('Slackwater: maintenance windows', events, now);
  }
  if (scope === null) throw new FeedNotFoundError();
  return buildFeedCalendar('Slackwater: planned work on your slices', await tenantFeedEvents(db, scope, range, config), now);
}
