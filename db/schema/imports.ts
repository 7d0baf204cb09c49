// Uploaded inventory files: the preview computed from each, and whether it was applied.
import { pgTable, text, integer, jsonb, timestamp, index } from 'drizzle-orm/pg-core';
import { users } from './auth';

export const IMPORT_KINDS = ['scenario', 'graphml', 'csv-sites', 'csv-spans', 'csv-slices'] as const;
export const IMPORT_STATES = ['previewed', 'applied', 'failed', 'superseded'] as const;

export const imports = pgTable(
  'imports',
  {
    id: text('id').primaryKey(),
    kind: text('kind', { enum: IMPORT_KINDS }).notNull(),
    fileName: text('file_name').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    status: text('status', { enum: IMPORT_STATES }).notNull().default('previewed'),
    /** what the preview showed: adds/changes/removes, errors and warnings */
    preview: jsonb('preview').notNull(),
    /** the parsed, normalised content to write on apply (null when the file had errors) */
    payload: jsonb('payload'),
    errorCount: integer('error_count').notNull().default(0),
    failureReason: text('failure_reason'),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    appliedBy: text('applied_by').references(() => users.id, { onDelete: 'set null' }),
    appliedAt: timestamp('applied_at', { withTimezone: true }),
  },
  (t) => [index('imports_created_idx').on(t.createdAt)],
);
