// The JobQueue routes and services use, on pg-boss.
import type PgBoss from 'pg-boss';
import { QUEUES, type JobQueue, type MailJob } from './queue';

export type PlanRunJobData = { planId: string };

/**
 * A slot search or campaign plan that has not finished in this long is taken from its worker (which died or hung)
 * and retried: the largest searches take about a minute, a campaign of many groups some more.
 */
export const SLOT_SEARCH_EXPIRE_SECONDS = 30 * 60;

/** Bosses pg-boss reported stopped; one listener per boss however many queues wrap it (the sweeper makes some). */
const watched = new WeakSet<PgBoss>();
const stopped = new WeakSet<PgBoss>();

/** `boss` is started; the queue counts as running until pg-boss reports it stopped. */
export function createJobQueue(boss: PgBoss): JobQueue {
  if (!watched.has(boss)) {
    watched.add(boss);
    boss.once('stopped', () => stopped.add(boss));
  }
  return {
    isRunning: () => !stopped.has(boss),
    async sendPlanRun(planId, { expireInSeconds }) {
      const data: PlanRunJobData = { planId };
      const id = await boss.send(QUEUES.planRun, data, { expireInSeconds: Math.max(1, Math.ceil(expireInSeconds)) });
      // send() answers null only for throttled/singleton sends, which plan runs never use.
      if (!id) throw new Error(`the job queue did not accept plan run ${planId}`);
      return id;
    },
    async cancelPlanRun(jobId) {
      // A running job is not interrupted by this: the worker sees the plan row's `cancelled` status and stops.
      await boss.cancel(QUEUES.planRun, jobId);
    },
    async sendSlotSearch(job) {
      const id = await boss.send(QUEUES.slotSearch, job, { expireInSeconds: SLOT_SEARCH_EXPIRE_SECONDS });
      if (!id) throw new Error(`the job queue did not accept the search ${job.id}`);
      return id;
    },
    async sendMail(job: MailJob) {
      const id = await boss.send(QUEUES.mail, job);
      if (!id) throw new Error(`the job queue did not accept the mail "${job.subject}"`);
      return id;
    },
  };
}
