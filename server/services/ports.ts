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

/** What the slot-search queue works: a slot search or the planning of a campaign (the row's id). */
export type SlotSearchJob = { kind: 'slots' | 'campaign'; id: string };

/** Queues slot searches and campaign plans for the slot-search worker. */
export interface SlotSearchQueue {
  /** Enqueues one search or campaign plan; returns the queue's job id. */
  sendSlotSearch(job: SlotSearchJob): Promise<string>;
}
