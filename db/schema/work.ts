// Maintenance windows, their elements, freezes, and the audit log.
import {
  pgTable, text, integer, doublePrecision, jsonb, timestamp, bigserial, index, customType,
} from 'drizzle-orm/pg-core';
import { users } from './auth';

export const WINDOW_STATES = [
  'draft', 'assessed', 'planned', 'in-review', 'cleared', 'returned',
  'notified', 'underway', 'done', 'rolled-back', 'withdrawn',
] as const;
export type WindowState = (typeof WINDOW_STATES)[number];

export const windows = pgTable(
  'windows',
  {
    id: text('id').primaryKey(),
    title: text('title').notNull(),
    startsAt: timestamp('starts_at', { withTimezone: true }).notNull(),
    endsAt: timestamp('ends_at', { withTimezone: true }).notNull(),
    workType: text('work_type'),
    notes: text('notes'),
    status: text('status', { enum: WINDOW_STATES }).notNull().default('draft'),
    ownerId: text('owner_id').references(() => users.id, { onDelete: 'set null' }),
    /** optimistic locking: every update bumps it; a stale edit is refused */
    version: integer('version').notNull().default(1),
    /** set when an admin booked the window inside a freeze: the written reason for overriding it */
    freezeOverrideReason: text('freeze_override_reason'),
    /** the move plan accepted for this window (plans.id); cleared when an edit sends it back to draft */
    acceptedPlanId: text('accepted_plan_id'),
    /** sign-off round: every submission for sign-off starts a new one; decisions count within their round */
    reviewRound: integer('review_round').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('windows_time_idx').on(t.startsAt, t.endsAt)],
);

/** The sites and spans a window takes out: `down`, or `reduced` to a fraction of capacity. */
export const windowElements = pgTable(
  'window_elements',
  {
    windowId: text('window_id').notNull().references(() => windows.id, { onDelete: 'cascade' }),
    elementKind: text('element_kind', { enum: ['site', 'span'] }).notNull(),
    elementId: text('element_id').notNull(),
    effect: text('effect', { enum: ['down', 'reduced'] }).notNull(),
    fraction: doublePrecision('fraction'),
  },
  (t) => [index('window_elements_window_idx').on(t.windowId), index('window_elements_element_idx').on(t.elementId)],
);

/** PostgreSQL bytea as a Node Buffer (drizzle has no built-in bytea column here). */
const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });

/** The window's method-of-procedure document (one per window; a new upload replaces it). */
export const windowDocuments = pgTable('window_documents', {
  windowId: text('window_id').primaryKey().references(() => windows.id, { onDelete: 'cascade' }),
  fileName: text('file_name').notNull(),
  mime: text('mime').notNull(),
  sizeBytes: integer('size_bytes').notNull(),
  content: bytea('content').notNull(),
  uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
  uploadedAt: timestamp('uploaded_at', { withTimezone: true }).notNull().defaultNow(),
});

/**
 * The stored impact of a window, computed for one version of it; an edit of its times or elements
 * deletes the row (DESIGN §3: the impact no longer holds).
 */
export const windowImpacts = pgTable('window_impacts', {
  windowId: text('window_id').primaryKey().references(() => windows.id, { onDelete: 'cascade' }),
  computedAt: timestamp('computed_at', { withTimezone: true }).notNull().defaultNow(),
  windowVersion: integer('window_version').notNull(),
  impact: jsonb('impact').notNull(),
});

export const freezes = pgTable('freezes', {
  id: text('id').primaryKey(),
  title: text('title').notNull(),
  startsAt: timestamp('starts_at', { withTimezone: true }).notNull(),
  endsAt: timestamp('ends_at', { withTimezone: true }).notNull(),
  reason: text('reason'),
  createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const auditLog = pgTable(
  'audit_log',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    actorId: text('actor_id'),
    action: text('action').notNull(),
    entity: text('entity').notNull(),
    entityId: text('entity_id'),
    before: jsonb('before'),
    after: jsonb('after'),
  },
  (t) => [index('audit_log_entity_idx').on(t.entity, t.entityId)],
);
