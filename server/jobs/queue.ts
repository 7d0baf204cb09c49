// The job queue the app hands to routes and services: both service ports in one. pg-boss sits behind it
// (server/jobs/boss-queue.ts); tests without a worker can pass their own.
import type { MailJob, MailQueue, PlanQueue, SlotSearchQueue } from '../services/ports';

export type { MailJob };

/**
 * The queues the services ask for (server/services/ports.ts), in one. Slot searches are optional: a queue without
 * them (a test's stand-in) makes the routes that start a search answer 503.
 */
export interface JobQueue extends PlanQueue, MailQueue, Partial<SlotSearchQueue> {
  /** started and not stopped (readiness asks); a queue without it counts as not running */
  isRunning?(): boolean;
}

export const QUEUES = {
  planRun: 'plan-run',
  /** plan runs whose retries are used up land here; its handler marks the plan failed */
  planRunDead: 'plan-run-dead',
  mail: 'mail-send',
  mailDead: 'mail-send-dead',
  /** slot searches and campaign plans ({ kind, id }); retries used up land on the dead-letter queue */
  slotSearch: 'slot-search',
  slotSearchDead: 'slot-search-dead',
} as const;

/** A queue for apps that must not run jobs (e.g. tests of unrelated routes): every call fails clearly. */
export const noJobQueue: JobQueue = {
  sendPlanRun: () => Promise.reject(new Error('no job queue configured')),
  cancelPlanRun: () => Promise.reject(new Error('no job queue configured')),
  sendMail: () => Promise.reject(new Error('no job queue configured')),
  isRunning: () => false,
};
