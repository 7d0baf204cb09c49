// Inputs and output of the campaign scheduler: element groups with their usable slots, the campaign's rules and
// the pairs that must not be out together; the schedule says which slot each group takes.

/** One usable start of a group (freezes, allowed hours and the finder's exclusions are already filtered out). */
export interface CampaignSlotOption {
  /** UTC instants, milliseconds */
  startMs: number;
  endMs: number;
  /** local date (YYYY-MM-DD, network zone) of the night the slot belongs to */
  night: string;
  /** the slot finder's ranking figure for this slot (points, lower is better) */
  cost: number;
}

export interface CampaignGroupInput {
  slots: CampaignSlotOption[];
  /** slice ids the group's work touches */
  touched: readonly string[];
  /** the group's name in the reasons and issues; "group N" (N counted from 1) when absent */
  label?: string;
}

export interface CampaignRules {
  /** at most this many of the campaign's windows on one night */
  maxPerNight: number;
  /** two windows touching a common slice lie at least this many calendar days apart (0: no limit) */
  minDaysBetweenTouches: number;
}

export interface CampaignProblem {
  groups: CampaignGroupInput[];
  rules: CampaignRules;
  /** index pairs [i, j] (i < j) of groups that must not overlap in time */
  clashes: Array<[number, number]>;
}

export interface CampaignSchedule {
  /** slot index per group, null = unscheduled */
  assignment: (number | null)[];
  /** why each unscheduled group found no slot, in words; null for a scheduled group */
  unscheduledReasons: (string | null)[];
  /**
   * The schedule's objective (points): its windows' costs plus UNSCHEDULED_PENALTY for each unscheduled group.
   * `windowsCost` is the windows' part alone.
   */
  totalCost: number;
  /** the same figure for the constructive start, before the local search */
  startCost: number;
  /** sum of the scheduled windows' costs (points), without the penalty */
  windowsCost: number;
  /** the constructive start's windows' costs (points, without the penalty) and its unscheduled groups */
  startWindowsCost: number;
  startUnscheduled: number;
  /** local-search steps applied (moves, swaps, insertions with one blocker moved) */
  moves: number;
  /** neighbourhood candidates evaluated, at most maxIterations */
  iterations: number;
}

export interface ScheduleOptions {
  /** seeds the search's random choices; the same seed gives the same schedule */
  seed?: number;
  /** neighbourhood candidates the local search may evaluate */
  maxIterations?: number;
  onProgress?: (done: number, total: number) => void;
}

/**
 * What leaving a group unscheduled costs, in points. Slot costs are a few hundred points at most, so even a whole
 * campaign's worth of them stays far below one penalty: the search first schedules as many groups as it can,
 * then makes them cheap.
 */
export const UNSCHEDULED_PENALTY = 1_000_000;
