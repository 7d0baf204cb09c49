// One-time links: a random token handed to one person (printed or mailed), stored only as its SHA-256 hash,
// good until it expires or is used once. `kind` says what the link opens.
import { pgTable, text, timestamp, index, uniqueIndex } from 'drizzle-orm/pg-core';
import { users } from './auth';

/**
 * `set-up`: create the first admin of an instance started without the demo. `invite`: an invited person sets a
 * password. `reset`: a person who forgot their password chooses a new one.
 */
export const ONE_TIME_LINK_KINDS = ['set-up', 'invite', 'reset'] as const;
export type OneTimeLinkKind = (typeof ONE_TIME_LINK_KINDS)[number];

export const oneTimeLinks = pgTable(
  'one_time_links',
  {
    id: text('id').primaryKey(),
    kind: text('kind', { enum: ONE_TIME_LINK_KINDS }).notNull(),
    /** hex SHA-256 of the token; the token itself is never stored */
    tokenHash: text('token_hash').notNull(),
    /** the account the link acts for, when it acts for one (none for set-up) */
    userId: text('user_id').references(() => users.id, { onDelete: 'cascade' }),
    /** the address the link was sent to, when it was sent */
    email: text('email'),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    usedAt: timestamp('used_at', { withTimezone: true }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('one_time_links_token_hash_key').on(t.tokenHash), index('one_time_links_kind_idx').on(t.kind)],
);
