// Idempotency keys of booking requests: a retried or double-submitted POST /api/windows with the same
// Idempotency-Key answers with the window the first request made instead of booking another.
import { pgTable, text, timestamp, primaryKey, index } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { windows } from './work';

export const windowIdempotencyKeys = pgTable(
  'window_idempotency_keys',
  {
    userId: text('user_id').notNull().references(() => users.id, { onDelete: 'cascade' }),
    /** the client's Idempotency-Key header, as sent */
    key: text('key').notNull(),
    /** SHA-256 of the request body: the same key with another body is refused */
    requestHash: text('request_hash').notNull(),
    /** the window the first request booked; set in the same transaction that claims the key */
    windowId: text('window_id').references(() => windows.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.key] }), index('window_idempotency_keys_created_idx').on(t.createdAt)],
);
