// The constructive start: the most constrained group first (fewest usable slots, then most touched slices), each
// taking its cheapest slot that keeps every rule with the groups already placed. A group with no such slot waits
// unscheduled for the local search. The same pass closes the search, so that a group left out never has a slot
// it could take, however the budget ran.
import { type CampaignState, UNSCHEDULED } from './campaign-state';

/** Groups in the order the constructive start places them. */
export function constructionOrder(state: CampaignState): number[] {
  const groups = state.c.problem.groups;
  const touched = groups.map((g) => new Set(g.touched).size);
  return groups.map((_, i) => i)
    .sort((a, b) => groups[a].slots.length - groups[b].slots.length || touched[b] - touched[a] || a - b);
}

/** The cheapest slot g may take as things stand (ties: earlier start, then lower index); -1 when none. */
export function cheapestLegalSlot(state: CampaignState, g: number, candidates?: readonly number[]): number {
  const slots = state.c.problem.groups[g].slots;
  const cost = state.c.cost[g];
  let best = -1;
  const consider = (s: number) => {
    if (!state.canPlace(g, s)) return;
    if (best < 0 || cost[s] < cost[best] || (cost[s] === cost[best] && slots[s].startMs < slots[best].startMs)) best = s;
  };
  if (candidates) for (const s of candidates) consider(s);
  else for (let s = 0; s < slots.length; s++) consider(s);
  return best;
}

/** Places each unscheduled group, in construction order, on its cheapest legal slot where it has one. */
export function construct(state: CampaignState): void {
  for (const g of constructionOrder(state)) {
    if (state.assign[g] !== UNSCHEDULED) continue;
    const s = cheapestLegalSlot(state, g);
    if (s >= 0) state.place(g, s);
  }
}
