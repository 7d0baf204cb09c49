// Slot searches (when does one window hurt least?) and campaigns (many windows: which nights?), both worked by the
// slot-search job queue. Shapes of the jsonb columns are in shared/slots.ts.
import { pgTable, text, integer, jsonb, timestamp, index } from 'drizzle-orm/pg-core';
import { users } from './auth';

/** The same lists as shared/slots.ts (SEARCH_STATUSES, CAMPAIGN_STATUSES); the schema stays free of app imports. */
const SEARCH_STATUSES = ['queued', 'running', 'done', 'failed'] as const;
const CAMPAIGN_STATUSES = ['queued', 'running', 'draft', 'booked', 'failed', 'discarded'] as const;

export const slotSearches = pgTable(
  'slot_searches',
  {
    /** 'ss-…' */
    id: text('id').primaryKey(),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    /** SlotSearchRequest (shared/slots.ts), as parsed */
    request: jsonb('request').notNull(),
    status: text('status', { enum: SEARCH_STATUSES }).notNull().default('queued'),
    /** SearchProgress while running */
    progress: jsonb('progress'),
    /** once done: { candidates, summary, elements } */
    result: jsonb('result'),
    /** readable reason when failed */
    error: text('error'),
    /** how many times a worker picked the search up (a retry after a crash counts) */
    attempts: integer('attempts').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp('started_at', { withTimezone: true }),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
    heartbeatAt: timestamp('heartbeat_at', { withTimezone: true }),
    /** the pg-boss job working it, stored when a worker takes it: the heartbeat sweep fails that job into a retry */
    jobId: text('job_id'),
  },
  (t) => [index('slot_searches_created_idx').on(t.createdAt)],
);

export const campaigns = pgTable(
  'campaigns',
  {
    /** 'cp-…' */
    id: text('id').primaryKey(),
    title: text('title').notNull(),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    /** CampaignCreate (shared/slots.ts) without the title, as parsed */
    request: jsonb('request').notNull(),
    status: text('status', { enum: CAMPAIGN_STATUSES }).notNull().default('queued'),
    /** optimistic locking: the planning result, every change and the booking bump it */
    version: integer('version').notNull().default(1),
    progress: jsonb('progress'),
    /**
     * The draft: windows, unscheduled groups, costs, and every group's usable slots and touched slices, kept so a
     * change can be checked against the same rules without searching again (server/services/campaigns/).
     */
    schedule: jsonb('schedule'),
    /** window ids once booked, in group order */
    bookedWindowIds: jsonb('booked_window_ids').notNull().default([]),
    error: text('error'),
    attempts: integer('attempts').notNull().default(0),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
    heartbeatAt: timestamp('heartbeat_at', { withTimezone: true }),
    /** as for slot searches: the pg-boss job planning it */
    jobId: text('job_id'),
  },
  (t) => [index('campaigns_status_idx').on(t.status, t.createdAt)],
);
