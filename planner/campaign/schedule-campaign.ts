// Campaign scheduler: which usable slot each element group takes so that no night holds more than maxPerNight
// windows, no slice is touched twice within minDaysBetweenTouches days, clashing groups never overlap, and the
// total cost (slot costs, plus a penalty per unscheduled group) is as low as the search finds.
// Method: a constructive start (most constrained group first, cheapest legal slot) and an iterated local search
// (moves, night swaps, insertions with one blocker moved; seeded kicks), deterministic for a seed.
// Reference: H. R. Lourenço, O. C. Martin, T. Stützle, "Iterated Local Search", Handbook of Metaheuristics (2003).
import { InvalidOptionError } from '../errors';
import { createRng } from '../random/rng';
import { CampaignState, UNSCHEDULED } from './campaign-state';
import { unscheduledReason } from './campaign-issues';
import { compileCampaign } from './compile-campaign';
import { construct } from './construct';
import { localSearch } from './local-search';
import { type CampaignProblem, type CampaignSchedule, type ScheduleOptions, UNSCHEDULED_PENALTY } from './types';

export { campaignIssues } from './campaign-issues';
export type {
  CampaignGroupInput, CampaignProblem, CampaignRules, CampaignSchedule, CampaignSlotOption, ScheduleOptions,
} from './types';
export { UNSCHEDULED_PENALTY } from './types';

/** 100,000 candidates take about 0.1–0.2 s on a 40-group, 21-night campaign (npm run bench:campaign). */
export const SCHEDULE_DEFAULTS = { seed: 1, maxIterations: 100_000 };

function windowsCostOf(state: CampaignState): number {
  let sum = 0;
  for (let g = 0; g < state.c.groupCount; g++) if (state.assign[g] !== UNSCHEDULED) sum += state.c.cost[g][state.assign[g]];
  return sum;
}

export function scheduleCampaign(p: CampaignProblem, opts: ScheduleOptions = {}): CampaignSchedule {
  const { seed, maxIterations, onProgress } = { ...SCHEDULE_DEFAULTS, ...opts };
  if (!Number.isInteger(maxIterations) || maxIterations < 0) throw new InvalidOptionError('maxIterations must be a whole number, 0 or more');
  const state = new CampaignState(compileCampaign(p));
  construct(state);
  const startCost = state.objective();
  const startWindowsCost = windowsCostOf(state);
  const startUnscheduled = state.assign.filter((s) => s === UNSCHEDULED).length;
  const counters = { iterations: 0, moves: 0 };
  localSearch({ state, rng: createRng(seed), counters, maxIterations, onProgress });
  construct(state);
  const assignment = Array.from(state.assign, (s) => (s === UNSCHEDULED ? null : s));
  return {
    assignment,
    unscheduledReasons: assignment.map((s, g) => (s === null ? unscheduledReason(state, g) : null)),
    totalCost: state.objective(),
    startCost,
    windowsCost: windowsCostOf(state),
    startWindowsCost,
    startUnscheduled,
    moves: counters.moves,
    iterations: counters.iterations,
  };
}

/** The objective of any assignment (slot costs plus the penalty per unscheduled group), summed in group order. */
export function campaignCost(p: CampaignProblem, assignment: (number | null)[]): number {
  let windows = 0;
  let unscheduled = 0;
  p.groups.forEach((g, i) => {
    const s = assignment[i];
    if (s === null || s === undefined) unscheduled++;
    else windows += g.slots[s].cost;
  });
  return windows + UNSCHEDULED_PENALTY * unscheduled;
}
