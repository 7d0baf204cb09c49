// API contract for move plans: the settings of a run, its progress, and the review of its result (DESIGN §3, §4.2–4.3).
import { z } from 'zod';

const id = z.string().min(1).max(200);

/** What a planner sets for one run of the re-mapper. */
export const planSettingsSchema = z.object({
  /** `serial` = one thread; `islands` = sub-populations in worker threads (same quality, faster on big windows) */
  mode: z.enum(['serial', 'islands']).default('serial'),
  seed: z.number().int().min(0).max(2 ** 31 - 1).default(1),
  population: z.number().int().min(8).max(400).default(40),
  timeLimitSeconds: z.number().min(1).max(600).default(20),
  /** function ids kept on their current site */
  pinned: z.array(id).max(1000).default([]),
  /** site ids no function may move to */
  excludedSites: z.array(id).max(1000).default([]),
  /** after the window: `return` = restore the original placements; `keep` = the new ones stay */
  afterWindow: z.enum(['return', 'keep']).default('return'),
  /** may the re-mapper move or reroute slices the window does not touch, to keep touched ones in service */
  knockOn: z.boolean().default(true),
  /** at most this many such knock-on moves in one plan */
  maxKnockOnMoves: z.number().int().min(0).max(50).default(5),
}).strict();
export type PlanSettings = z.infer<typeof planSettingsSchema>;
export type PlanSettingsInput = z.input<typeof planSettingsSchema>;

export const PLAN_RUN_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export const planRunStatusSchema = z.enum(PLAN_RUN_STATUSES);
export type PlanRunStatus = z.infer<typeof planRunStatusSchema>;

/** The lexicographic objective (planner/model/types.ts Objective). */
export const objectiveSchema = z.object({
  unresolvedWeight: z.number(), unresolved: z.number(), moved: z.number(), rerouted: z.number(),
  moveCost: z.number(), usage: z.number(), peakUtilisation: z.number(),
});
export type PlanObjective = z.infer<typeof objectiveSchema>;

export const planProgressSchema = z.object({
  phase: z.enum(['preparing', 'searching', 'references', 'finishing']),
  generation: z.number().int(),
  evaluations: z.number().int(),
  /** best objective so far; null before the first generation */
  best: objectiveSchema.nullable(),
  elapsedMs: z.number(),
  timeLimitMs: z.number(),
});
export type PlanProgress = z.infer<typeof planProgressSchema>;

export const tracePointSchema = z.object({
  generation: z.number().int(), evaluations: z.number().int(), best: objectiveSchema, feasible: z.boolean(),
});

export const placementSchema = z.object({
  /** function id → site id */
  sites: z.record(z.string(), z.string()),
  /** tie id → ordered span ids */
  paths: z.record(z.string(), z.array(z.string())),
});
export type PlacementView = z.infer<typeof placementSchema>;

export const sliceOutcomeSchema = z.enum(['stays', 'reroute', 'move', 'unresolved']);
export type SliceOutcome = z.infer<typeof sliceOutcomeSchema>;

/** One affected slice in a plan: outcome and before → after of everything that changes. */
export const planSliceSchema = z.object({
  slice: z.string(),
  name: z.string(),
  tenantId: z.string(),
  critical: z.boolean(),
  priority: z.number().int(),
  sst: z.number().int(),
  /** impact reasons: hosted, transit, squeezed, unprotected */
  reasons: z.array(z.string()),
  outcome: sliceOutcomeSchema,
  moves: z.array(z.object({ function: z.string(), from: z.string(), to: z.string() })),
  reroutes: z.array(z.object({ tie: z.string(), from: z.array(z.string()), to: z.array(z.string()) })),
  before: placementSchema,
  /** null when unresolved */
  after: placementSchema.nullable(),
  /** unresolved: which constraint stopped it */
  unresolvedReason: z.string().nullable(),
  /**
   * Knock-on move: the window does not touch this slice; it moves to make room for these touched slices.
   * Empty for the window's own affected slices.
   */
  madeRoomFor: z.array(z.object({ slice: z.string(), name: z.string() })).default([]),
});
export type PlanSlice = z.infer<typeof planSliceSchema>;

export const planStepSchema = z.object({
  slice: z.string(),
  kind: z.enum(['move-function', 'reroute-tie']),
  element: z.string(),
  from: z.union([z.string(), z.array(z.string())]),
  to: z.union([z.string(), z.array(z.string())]),
  /** only fits with temporary spare capacity */
  needsSpare: z.boolean(),
  /** a knock-on move (ordered before the moves it makes room for) */
  knockOn: z.boolean().default(false),
});
export type PlanStep = z.infer<typeof planStepSchema>;

export const sliceRiskSchema = z.object({
  slice: z.string(),
  failureProbability: z.number(),
  unprotected: z.boolean(),
  severity: z.enum(['low', 'medium', 'high', 'critical']),
});
export type SliceRiskView = z.infer<typeof sliceRiskSchema>;

/** A reference solver's answer for the same window, shown beside the DE result. */
export const referenceResultSchema = z.object({
  solver: z.enum(['greedy', 'exact']),
  /** null when it was skipped or found nothing */
  objective: objectiveSchema.nullable(),
  elapsedMs: z.number(),
  /** exact: proven optimal, relative gap to the bound, the bound itself (on the weighted objective) */
  optimal: z.boolean().nullable(),
  gap: z.number().nullable(),
  bound: z.number().nullable(),
  /** why it was skipped or what limited it, in plain words */
  note: z.string().nullable(),
});
export type ReferenceResult = z.infer<typeof referenceResultSchema>;

/** Everything the review screen shows for a finished run. */
export const planReviewSchema = z.object({
  affected: z.array(z.string()),
  objective: objectiveSchema,
  totals: z.object({
    stays: z.number().int(), moved: z.number().int(), rerouted: z.number().int(),
    unresolved: z.number().int(), moveCost: z.number(),
    /** slices the window does not touch, moved or rerouted to make room (also counted in moved / rerouted) */
    knockOn: z.number().int().default(0),
  }),
  slices: z.array(planSliceSchema),
  steps: z.array(planStepSchema),
  /** steps that cannot be ordered without temporary spare capacity */
  needsSpare: z.number().int(),
  risk: z.array(sliceRiskSchema),
  trace: z.array(tracePointSchema),
  greedy: referenceResultSchema,
  exact: referenceResultSchema.nullable(),
  /** windows overlapping in time whose accepted plans were reserved for this run */
  reservedFor: z.array(z.string()),
  /** the DE search itself (excludes queueing and the reference solvers) */
  computeMs: z.number(),
  /**
   * What the search alone found, before any fallback; `usedFallback` says when the greedy plan was kept instead
   * because the search's own was worse or infeasible. Null for runs stored before this was recorded.
   */
  search: z.object({
    objective: objectiveSchema, feasible: z.boolean(), usedFallback: z.enum(['greedy']).nullable(),
  }).nullable().default(null),
});
export type PlanReview = z.infer<typeof planReviewSchema>;

export const planSchema = z.object({
  id: z.string(),
  windowId: z.string(),
  windowVersion: z.number().int(),
  status: planRunStatusSchema,
  settings: planSettingsSchema,
  progress: planProgressSchema.nullable(),
  error: z.string().nullable(),
  attempts: z.number().int(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
  /** the window was edited after this run: it can no longer be accepted */
  stale: z.boolean(),
  /** this run is the window's accepted plan */
  accepted: z.boolean(),
  acceptedAt: z.string().nullable(),
  outageAccepted: z.array(z.string()),
  /** present when status is `done` */
  review: planReviewSchema.nullable(),
});
export type Plan = z.infer<typeof planSchema>;

/** List rows leave the review out; totals show how the run went. */
export const planListItemSchema = planSchema.omit({ review: true }).extend({
  totals: planReviewSchema.shape.totals.nullable(),
});
export type PlanListItem = z.infer<typeof planListItemSchema>;

export const planResponseSchema = z.object({ plan: planSchema });
export const planListResponseSchema = z.object({ plans: z.array(planListItemSchema) });

/** Accepting: every slice the plan leaves unresolved must be listed, so the outage is a conscious choice. */
export const planAcceptSchema = z.object({
  outageAccepted: z.array(id).max(10_000).default([]),
  /** the window's accepted plan this one replaces: without it, accepting while another plan is accepted is refused */
  replacesPlanId: id.optional(),
}).strict();
export type PlanAccept = z.infer<typeof planAcceptSchema>;
