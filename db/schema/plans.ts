// Move-plan runs (one row per run of the re-mapper for a window) and their queue state.
import { pgTable, text, integer, jsonb, timestamp, index } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { windows } from './work';

export const PLAN_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

export const plans = pgTable(
  'plans',
  {
    id: text('id').primaryKey(),
    windowId: text('window_id').notNull().references(() => windows.id, { onDelete: 'cascade' }),
    /** the window version the run was made for; an edit of the window makes the run stale */
    windowVersion: integer('window_version').notNull(),
    status: text('status', { enum: PLAN_STATUSES }).notNull().default('queued'),
    /** PlanSettings (shared/plans.ts) */
    settings: jsonb('settings').notNull(),
    /** PlanProgress while running (shared/plans.ts) */
    progress: jsonb('progress'),
    /** PlanReview once done (shared/plans.ts) */
    result: jsonb('result'),
    /** readable reason when failed or cancelled */
    error: text('error'),
    /** pg-boss job id */
    jobId: text('job_id'),
    /** how many times a worker picked the run up (retries after a crash count) */
    attempts: integer('attempts').notNull().default(0),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp('started_at', { withTimezone: true }),
    /** the running attempt's last sign of life (database clock); a stale one means its worker died */
    heartbeatAt: timestamp('heartbeat_at', { withTimezone: true }),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
    /** slices the planner accepted an outage for when accepting a plan that leaves them unresolved */
    outageAccepted: text('outage_accepted').array(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    acceptedBy: text('accepted_by').references(() => users.id, { onDelete: 'set null' }),
  },
  (t) => [index('plans_window_idx').on(t.windowId, t.createdAt)],
);
