// How much background work one person may have waiting or running at once, per kind of job. The server refuses a
// request over the cap (429 TOO_MANY_WAITING); the screens show its message as they show any refusal.
//
// The caps are per person only; there is no cap over everyone. The defaults follow the common practice of small
// per-user caps on queued jobs (a few per person, as shared job queues and CI services set them): enough for a
// person to compare a couple of alternatives side by side, too few for one account or a script with a stolen
// session to stall everyone else's work on a 2-core server. The server's environment may change them
// (WAITING_SLOT_SEARCHES_PER_PERSON, WAITING_CAMPAIGN_PLANS_PER_PERSON, WAITING_PLAN_RUNS_PER_PERSON).

export const WAITING_JOB_KINDS = ['slotSearches', 'campaignPlans', 'planRuns'] as const;
export type WaitingJobKind = (typeof WAITING_JOB_KINDS)[number];

/** Unfinished (queued or running) jobs one person may have of each kind. */
export type WaitingJobLimits = Readonly<Record<WaitingJobKind, number>>;

export const DEFAULT_WAITING_JOB_LIMITS: WaitingJobLimits = {
  slotSearches: 3,
  campaignPlans: 2,
  planRuns: 2,
};
