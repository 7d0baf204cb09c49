// What services ask of the world outside the database, as plain interfaces. The real implementations
// (server/jobs/ on pg-boss, a test's stand-in) satisfy them structurally, so services never import them.

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

/** Queues e-mail: sign-off requests, send-backs, tenant notices. */
export interface MailQueue {
  /** Enqueues one e-mail; returns the queue's job id. */
  sendMail(job: MailJob): Promise<string>;
}

/** Queues plan runs for the plan worker. */
export interface PlanQueue {
  /** Enqueues a plan run (plans.id); returns the queue's job id. */
  sendPlanRun(planId: string, options: { expireInSeconds: number }): Promise<string>;
  /** Cancels a queued or running plan run's job (the worker stops the computation). */
  cancelPlanRun(jobId: string): Promise<void>;
}
