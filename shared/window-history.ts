// API contract for a window's history (staff only): what happened, when, by whom, with the comment given.
import { z } from 'zod';
import { windowStatusSchema } from './windows';

/** What happened, in our own words; the app turns each into a sentence. */
export const WINDOW_EVENT_KINDS = [
  'booked', 'edited', 'assessed', 'mop-attached', 'run-started', 'run-cancelled', 'run-failed',
  'plan-accepted', 'submitted', 'approved', 'sent-back', 'cleared', 'notified', 'moved',
] as const;
export const windowEventKindSchema = z.enum(WINDOW_EVENT_KINDS);
export type WindowEventKind = z.infer<typeof windowEventKindSchema>;

export const windowEventSchema = z.object({
  id: z.string(),
  kind: windowEventKindSchema,
  /** UTC instant (ISO 8601 with Z) */
  at: z.string(),
  /** the person's name; null when the system did it or the person is no longer listed */
  by: z.string().nullable(),
  /** the state the window was in after the event, when it changed */
  status: windowStatusSchema.nullable(),
  /** a comment or reason given with the event (sign-off decisions, returns, lifecycle steps) */
  comment: z.string().nullable(),
  /** an edit sent the window back to draft (its impact and plan are void) */
  reverted: z.boolean(),
  /** the sign-off round of a decision, submission or clearance */
  round: z.number().int().nullable(),
});
export type WindowEvent = z.infer<typeof windowEventSchema>;

export const windowHistorySchema = z.object({ windowId: z.string(), events: z.array(windowEventSchema) });
export type WindowHistory = z.infer<typeof windowHistorySchema>;
