// Private calendar feeds: one subscription address per user, revocable. The token is kept so the owner can read
// the address again (it is a secret like a password); look-ups go by its SHA-256 through a unique index.
import { pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { users } from './auth';

export const calendarFeeds = pgTable(
  'calendar_feeds',
  {
    userId: text('user_id').primaryKey().references(() => users.id, { onDelete: 'cascade' }),
    /** 32 random bytes, base64url: the secret part of the subscription address */
    token: text('token').notNull(),
    /** hex SHA-256 of the token: what a feed request is looked up by */
    tokenHash: text('token_hash').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull(),
  },
  (t) => [uniqueIndex('calendar_feeds_token_hash_key').on(t.tokenHash)],
);
