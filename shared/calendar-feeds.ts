// The signed-in user's private calendar feed: the subscription address (a secret like a password) and how far the
// feed reaches back and ahead.
import { z } from 'zod';

export const calendarFeedSchema = z.object({
  /** the subscription address; anyone holding it reads the feed without signing in */
  url: z.url(),
  /** when this address was made (replacing it makes a new one) */
  createdAt: z.iso.datetime({ offset: true }),
});
export type CalendarFeed = z.infer<typeof calendarFeedSchema>;

/** Work that ended up to this many days ago stays in the feed (cancelled work too), so calendars show what happened. */
export const FEED_PAST_DAYS = 30;
/** Work starting up to this many days ahead is in the feed. */
export const FEED_AHEAD_DAYS = 365;
