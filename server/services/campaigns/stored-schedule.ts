// A draft campaign as stored on its row: every group's usable slots (so a planner's move is checked against the
// same options without searching again), the clashes between groups, and the chosen slot per group.
import { z } from 'zod';
import { namedElementSchema, type CampaignCreate } from '../../../shared/slots';
import type { CampaignProblem } from './engine';

const storedSlotSchema = z.object({
  start: z.string(),
  end: z.string(),
  startMs: z.number(),
  endMs: z.number(),
  night: z.string(),
  cost: z.number(),
  touched: z.number(),
  unresolved: z.number().nullable(),
  /** critical slices the work touches (drafts stored before it was kept: 0) */
  criticalTouched: z.number().default(0),
  explanation: z.string(),
});
export type StoredSlot = z.infer<typeof storedSlotSchema>;

export const storedScheduleSchema = z.object({
  groups: z.array(z.object({
    label: z.string(),
    elements: z.array(namedElementSchema),
    /** usable slots, best first */
    slots: z.array(storedSlotSchema),
    /** slice ids the group's work touches */
    touched: z.array(z.string()),
  })),
  clashes: z.array(z.tuple([z.number(), z.number()])),
  /** index into the group's slots; null when unscheduled */
  assignment: z.array(z.number().nullable()),
  unscheduledReasons: z.array(z.string().nullable()),
  /** The constructive start's windows' sum (points, no penalty), to read beside the draft's. */
  startCost: z.number(),
  /** groups the constructive start placed; the local search may fit in more (older drafts: absent) */
  startScheduled: z.number().int().optional(),
  moves: z.number(),
  iterations: z.number(),
});
export type StoredSchedule = z.infer<typeof storedScheduleSchema>;

/** The request as stored (the title lives in its own column). */
export type CampaignRequest = Omit<CampaignCreate, 'title'>;

export function problemOf(s: StoredSchedule, request: Pick<CampaignRequest, 'maxPerNight' | 'minDaysBetweenTouches'>): CampaignProblem {
  return {
    groups: s.groups.map((g) => ({
      label: g.label, slots: g.slots.map(({ startMs, endMs, night, cost }) => ({ startMs, endMs, night, cost })), touched: g.touched,
    })),
    rules: { maxPerNight: request.maxPerNight, minDaysBetweenTouches: request.minDaysBetweenTouches },
    clashes: s.clashes,
  };
}

/** Costs are read to a hundredth of a point; sums of them drop the floating-point dust. */
export const roundCost = (points: number) => Math.round(points * 100) / 100;

/** Sum of the scheduled windows' costs (points). */
export function totalCostOf(s: StoredSchedule): number {
  return roundCost(s.assignment.reduce<number>((sum, slot, g) => sum + (slot === null ? 0 : s.groups[g].slots[slot].cost), 0));
}
