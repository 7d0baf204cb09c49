// API contract for one approver's side of sign-off: the count of windows waiting for their decision (tab badge,
// overview panel) and the decisions they already made ("Decided by me" in the queue).
import { z } from 'zod';
import { signoffDecisionSchema } from './signoff';

/** GET /api/signoff/waiting-count: 0 for a user who is not an approver. */
export const signoffWaitingCountSchema = z.object({ waiting: z.number().int().min(0) });
export type SignoffWaitingCount = z.infer<typeof signoffWaitingCountSchema>;

export const decidedByMeItemSchema = z.object({
  windowId: z.string(),
  title: z.string(),
  /** the window's state now (it may have moved on since the decision) */
  windowStatus: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  round: z.number().int(),
  /** the window's review round now; a decision from an earlier round no longer counts */
  currentRound: z.number().int(),
  decision: signoffDecisionSchema,
  comment: z.string().nullable(),
  codeConfirmed: z.boolean(),
  decidedAt: z.string(),
});
export type DecidedByMeItem = z.infer<typeof decidedByMeItemSchema>;

/** GET /api/signoff/decided-by-me: newest first, at most DECIDED_BY_ME_LIMIT. */
export const decidedByMeSchema = z.object({ decisions: z.array(decidedByMeItemSchema) });
export type DecidedByMe = z.infer<typeof decidedByMeSchema>;

/** Enough to find last month's decisions on a phone without paging. */
export const DECIDED_BY_ME_LIMIT = 30;
