// The exact reference for small campaigns: a depth-first enumeration of every legal assignment, pruned only where
// even the cheapest completion cannot beat the best found. Used by the tests and the benchmark to measure the local
// search's gap; far too slow beyond a handful of groups.
import { InvalidOptionError } from '../errors';
import { CampaignState, UNSCHEDULED } from './campaign-state';
import { compileCampaign } from './compile-campaign';
import type { CampaignProblem } from './types';
import { UNSCHEDULED_PENALTY } from './types';

/** The most partial assignments the enumeration visits before it gives up. */
export const BRUTE_FORCE_MAX_NODES = 5_000_000;

export interface BruteForceResult { assignment: (number | null)[]; cost: number; nodes: number }

export function bruteForceCampaign(p: CampaignProblem): BruteForceResult {
  const state = new CampaignState(compileCampaign(p));
  const n = p.groups.length;
  // cheapest possible cost of groups g … n-1, whatever the others do
  const rest = new Float64Array(n + 1);
  for (let g = n - 1; g >= 0; g--) {
    const costs = p.groups[g].slots.map((s) => s.cost);
    rest[g] = rest[g + 1] + Math.min(UNSCHEDULED_PENALTY, ...costs);
  }
  // cheapest slots first, so a good schedule is found early and prunes the rest
  const byCost = p.groups.map((g) => g.slots.map((_, s) => s).sort((a, b) => g.slots[a].cost - g.slots[b].cost));
  let best: Int32Array = state.snapshot();
  let bestCost = Infinity;
  let nodes = 0;
  // Groups placed so far are all earlier ones, so checking g against the placed ones checks every pair once.
  const walk = (g: number, cost: number) => {
    if (++nodes > BRUTE_FORCE_MAX_NODES) {
      throw new InvalidOptionError(`more than ${BRUTE_FORCE_MAX_NODES} partial assignments: too big to enumerate`);
    }
    if (cost + rest[g] >= bestCost) return;
    if (g === n) {
      bestCost = cost;
      best = state.snapshot();
      return;
    }
    for (const s of byCost[g]) {
      if (!state.canPlace(g, s)) continue;
      state.place(g, s);
      walk(g + 1, cost + p.groups[g].slots[s].cost);
      state.unplace(g);
    }
    walk(g + 1, cost + UNSCHEDULED_PENALTY);
  };
  walk(0, 0);
  return { assignment: Array.from(best, (s) => (s === UNSCHEDULED ? null : s)), cost: bestCost, nodes };
}
