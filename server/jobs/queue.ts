// What routes and services may ask of the job queue. pg-boss sits behind it (server/jobs/boss-queue.ts);
// tests without a worker can pass their own.

/** One e-mail to send through the queue (retried on failure). */
export interface MailJob {
  to: string[];
  subject: string;
  text: string;
  /** iCalendar invitation: sent as a text/calendar alternative with its METHOD, and as an .ics attachment */
  calendar?: { method: 'REQUEST' | 'CANCEL'; content: string; filename: string };
  /** set for tenant notices: the worker records sending state and errors on this row */
  noticeId?: string;
  /**
   * The notice version this mail carries (notices.sequence). Notices are queued inside the transaction that
   * writes them, so the worker sends only once that version is committed, and never a superseded one.
   */
  noticeSequence?: number;
}

export interface JobQueue {
  /** Enqueues a plan run (plans.id); returns the queue's job id. */
  sendPlanRun(planId: string, options: { expireInSeconds: number }): Promise<string>;
  /** Cancels a queued or running plan run's job (the worker stops the computation). */
  cancelPlanRun(jobId: string): Promise<void>;
  /** Enqueues one e-mail; returns the queue's job id. */
  sendMail(job: MailJob): Promise<string>;
}

export const QUEUES = {
  planRun: 'plan-run',
  /** plan runs whose retries are used up land here; its handler marks the plan failed */
  planRunDead: 'plan-run-dead',
  mail: 'mail-send',
  mailDead: 'mail-send-dead',
} as const;

/** A queue for apps that must not run jobs (e.g. tests of unrelated routes): every call fails clearly. */
export const noJobQueue: JobQueue = {
  sendPlanRun: () => Promise.reject(new Error('no job queue configured')),
  cancelPlanRun: () => Promise.reject(new Error('no job queue configured')),
  sendMail: () => Promise.reject(new Error('no job queue configured')),
};
