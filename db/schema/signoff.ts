// Change-board decisions, approvers' one-time-code keys, tenant notices, and the local SMTP sink's messages.
import { pgTable, text, integer, boolean, jsonb, timestamp, bigserial, index, uniqueIndex } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { tenants } from './network';
import { windows } from './work';

export const SIGNOFF_DECISIONS = ['approve', 'send-back'] as const;
export type SignoffDecision = (typeof SIGNOFF_DECISIONS)[number];

export const signoffs = pgTable(
  'signoffs',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    windowId: text('window_id').notNull().references(() => windows.id, { onDelete: 'cascade' }),
    /** windows.review_round at the time of the decision */
    round: integer('round').notNull(),
    planId: text('plan_id').notNull(),
    approverId: text('approver_id').notNull().references(() => users.id, { onDelete: 'restrict' }),
    decision: text('decision', { enum: SIGNOFF_DECISIONS }).notNull(),
    comment: text('comment'),
    /** confirmed with a time-based one-time code */
    codeConfirmed: boolean('code_confirmed').notNull().default(false),
    decidedAt: timestamp('decided_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('signoffs_one_per_round_key').on(t.windowId, t.round, t.approverId)],
);

/** TOTP key per user (RFC 6238); `confirmedAt` null until the user proved the authenticator works. */
export const userOtpKeys = pgTable('user_otp_keys', {
  userId: text('user_id').primaryKey().references(() => users.id, { onDelete: 'cascade' }),
  /** the shared key, base32 (RFC 4648) without padding */
  keyBase32: text('key_base32').notNull(),
  confirmedAt: timestamp('confirmed_at', { withTimezone: true }),
  /** last accepted time step (unix seconds / 30); a code of this step or earlier is a replay */
  lastUsedStep: integer('last_used_step'),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const NOTICE_STATUSES = ['blocked', 'queued', 'sent', 'failed'] as const;
export type NoticeStatus = (typeof NOTICE_STATUSES)[number];

/** One notice per window and tenant; each change re-sends it with SEQUENCE + 1; withdrawal sends a CANCEL. */
export const notices = pgTable(
  'notices',
  {
    id: text('id').primaryKey(),
    windowId: text('window_id').notNull().references(() => windows.id, { onDelete: 'cascade' }),
    tenantId: text('tenant_id').notNull().references(() => tenants.id, { onDelete: 'cascade' }),
    /** iCalendar UID, stable per window and tenant (RFC 5545 §3.8.4.7) */
    uid: text('uid').notNull(),
    /** iCalendar SEQUENCE (RFC 5545 §3.8.7.4): 0 first, +1 on each significant change */
    sequence: integer('sequence').notNull().default(0),
    /** iTIP method of the latest version (RFC 5546) */
    method: text('method', { enum: ['REQUEST', 'CANCEL'] }).notNull().default('REQUEST'),
    status: text('status', { enum: NOTICE_STATUSES }).notNull().default('queued'),
    subject: text('subject').notNull(),
    /** plain-text e-mail body */
    body: text('body').notNull(),
    /** tenant-facing content (slices, moves, effect, times, contact) for the portal */
    content: jsonb('content').notNull(),
    /** the .ics attached to the latest e-mail */
    ics: text('ics').notNull(),
    /** admin's reason for sending later than the tenant's notice lead time */
    leadOverrideReason: text('lead_override_reason'),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    acknowledgedAt: timestamp('acknowledged_at', { withTimezone: true }),
    acknowledgedBy: text('acknowledged_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('notices_window_tenant_key').on(t.windowId, t.tenantId), index('notices_tenant_idx').on(t.tenantId)],
);

/** Every message the local SMTP sink received (the fake for a hosted mail service). */
export const sinkMessages = pgTable(
  'sink_messages',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
    envelopeFrom: text('envelope_from'),
    envelopeTo: text('envelope_to').array().notNull(),
    subject: text('subject'),
    /** the whole RFC 5322 message as received */
    raw: text('raw').notNull(),
    sizeBytes: integer('size_bytes').notNull(),
    meta: jsonb('meta'),
  },
  (t) => [index('sink_messages_received_idx').on(t.receivedAt)],
);
