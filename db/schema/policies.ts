// Admin-set policies (max window length, booking clock skew, …): one row per key; code holds the defaults.
import { pgTable, text, jsonb, timestamp } from 'drizzle-orm/pg-core';
import { users } from './auth';

export const policies = pgTable('policies', {
  key: text('key').primaryKey(),
  value: jsonb('value').notNull(),
  updatedBy: text('updated_by').references(() => users.id, { onDelete: 'set null' }),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
