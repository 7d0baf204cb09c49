// API contract for the change-board pack: one window with its accepted plan, ready to print, everything by name.
// The moves CSV for field teams is built from the same step rows, so the page and the file list the same moves.
import { z } from 'zod';
import { objectiveSchema, referenceResultSchema, sliceOutcomeSchema } from './plans';
import { signoffDecisionSchema } from './signoff';
import { touchCountsSchema } from './touch-counts';
import { windowEventSchema } from './window-history';

/** One make-before-break step, in order, named for the people who carry it out. */
export const packStepSchema = z.object({
  /** 1-based position in the make-before-break order */
  order: z.number().int().min(1),
  sliceName: z.string(),
  tenantName: z.string(),
  kind: z.enum(['move-function', 'reroute-tie']),
  /** the function's name, or a link as "the link A – B" by its end functions */
  what: z.string(),
  /** move-function: the sites; null for a reroute */
  fromSite: z.string().nullable(),
  toSite: z.string().nullable(),
  /** reroute-tie: the paths as site names in order ("A → B → C"); null for a function move */
  fromPath: z.string().nullable(),
  toPath: z.string().nullable(),
  /** a knock-on move: the slice is not touched by the work and moves to make room for these slices (names) */
  madeRoomFor: z.array(z.string()),
  /** the step only fits with temporary spare capacity */
  needsSpare: z.boolean(),
});
export type PackStep = z.infer<typeof packStepSchema>;

export const packSliceSchema = z.object({
  name: z.string(),
  tenantName: z.string(),
  outcome: sliceOutcomeSchema,
  critical: z.boolean(),
  unresolvedReason: z.string().nullable(),
  outageAccepted: z.boolean(),
  madeRoomFor: z.array(z.string()),
});

export const packRiskSchema = z.object({
  sliceName: z.string(),
  severity: z.enum(['low', 'medium', 'high', 'critical']),
  failureProbability: z.number(),
  unprotected: z.boolean(),
});

export const changePackSchema = z.object({
  window: z.object({
    id: z.string(), title: z.string(), workType: z.string().nullable(), status: z.string(),
    startsAt: z.string(), endsAt: z.string(), ownerName: z.string().nullable(),
    elements: z.array(z.object({ kind: z.enum(['site', 'span']), name: z.string(), effect: z.enum(['down', 'reduced']), fraction: z.number().nullable() })),
  }),
  mop: z.object({ fileName: z.string() }).nullable(),
  /** shared/touch-counts.ts, the same figures the impact screen, plan review and sign-off show; null before assessment */
  touch: touchCountsSchema.nullable(),
  /** the window's accepted plan (the one submitted for sign-off); null when there is none yet */
  plan: z.object({
    acceptedAt: z.string().nullable(),
    acceptedByName: z.string().nullable(),
    afterWindow: z.enum(['return', 'keep']),
    slices: z.array(packSliceSchema),
    steps: z.array(packStepSchema),
    /** how many steps need temporary spare capacity */
    needsSpare: z.number().int(),
    /** the run beside the greedy and exact references, as the plan screen shows them */
    references: z.object({
      objective: objectiveSchema,
      computeMs: z.number(),
      search: z.object({ objective: objectiveSchema, feasible: z.boolean(), usedFallback: z.enum(['greedy']).nullable() }).nullable(),
      greedy: referenceResultSchema,
      exact: referenceResultSchema.nullable(),
    }),
    risk: z.array(packRiskSchema),
    /** names of the plan's slices that carry public-safety, health or utility services */
    criticalSlices: z.array(z.string()),
  }).nullable(),
  decisions: z.array(z.object({
    round: z.number().int(), approverName: z.string(), decision: signoffDecisionSchema, comment: z.string().nullable(),
    codeConfirmed: z.boolean(), decidedAt: z.string(),
  })),
  /** comments and reasons given along the window's history, other than the decisions above */
  comments: z.array(windowEventSchema),
  generatedAt: z.string(),
});
export type ChangePack = z.infer<typeof changePackSchema>;
