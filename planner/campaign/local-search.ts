// The local search after the constructive start: an iterated local search. A descent applies improving steps
// until none is left — a group moves to a cheaper legal slot, two groups exchange nights, an unscheduled group
// goes in (directly, or after moving the one group blocking a slot: an ejection chain of depth 1) — then a
// seeded kick re-places a few random groups and the descent runs again; the best schedule seen is kept.
import { randomInt } from '../random/rng';
import { type CampaignState, UNSCHEDULED } from './campaign-state';
import { EPS, type SearchCtx, shuffled, spent, tick, tryInsert, tryMove, trySwap } from './search-steps';
import { UNSCHEDULED_PENALTY } from './types';

/** A kick re-places between 1 and this many groups. */
const MAX_KICK_GROUPS = 4;
/** Share of kicks that force an unscheduled group in rather than re-place random groups. */
const FORCED_INSERT_SHARE = 0.5;
/**
 * A kicked schedule is searched on from while it has no more unscheduled groups than the best (its windows may
 * cost more: half a penalty is the allowance), so the search can cross to schedules a single step cannot reach;
 * after this many kicks without a new best it returns to the best.
 */
const ACCEPT_WORSE_BY = UNSCHEDULED_PENALTY / 2;
const RETURN_TO_BEST_AFTER = 30;
/** Kicks in a row without a new best after which the search stops early: small campaigns are settled long before. */
const STALL_KICKS = 2000;

/** Whether g, unscheduled or on a dearer slot, has a slot on `night` that would be an improvement. */
function wantsNight(state: CampaignState, g: number, night: number): boolean {
  const a = state.assign[g];
  if (a === UNSCHEDULED) return true;
  const cost = state.c.cost[g];
  return (state.c.slotsByNight[g].get(night) ?? []).some((s) => cost[s] < cost[a] - EPS);
}

/**
 * Queues the groups that may have gained a step since `before`: the changed ones, their spacing and clash
 * neighbours, and the groups that would gain from a place coming free on a night a changed group left.
 */
function queueAffected(ctx: SearchCtx, before: Int32Array, push: (g: number) => void): void {
  const { state } = ctx;
  const { c } = state;
  for (let x = 0; x < c.groupCount; x++) {
    const from = before[x];
    if (state.assign[x] === from) continue;
    push(x);
    c.touchNeighbours[x].forEach(push);
    c.clashNeighbours[x].forEach(push);
    if (from === UNSCHEDULED) continue;
    const night = c.night[x][from];
    for (const g of c.groupsByNight[night]) if (wantsNight(state, g, night)) push(g);
  }
}

/**
 * Improving steps until none is left or the budget is spent. Each group in `start` (in a seeded order) is examined;
 * after a step only the groups it may have helped are examined again, so a descent after a kick stays local.
 */
function descend(ctx: SearchCtx, start: number[]): void {
  const { state } = ctx;
  const queued = new Uint8Array(state.c.groupCount);
  const queue: number[] = [];
  const push = (g: number) => {
    if (queued[g]) return;
    queued[g] = 1;
    queue.push(g);
  };
  const order = shuffled(ctx.rng, start.length);
  order.forEach((i) => push(start[i]));
  let before = state.snapshot();
  for (let head = 0; head < queue.length && !spent(ctx); head++) {
    const g = queue[head];
    queued[g] = 0;
    const step = state.assign[g] === UNSCHEDULED ? tryInsert(ctx, g) : tryMove(ctx, g) || trySwap(ctx, g);
    if (!step) continue;
    queueAffected(ctx, before, push);
    before = state.snapshot();
  }
}

/** Takes 1 to MAX_KICK_GROUPS random groups out and puts each back on a random legal slot. */
function randomKick(ctx: SearchCtx): void {
  const { state, rng } = ctx;
  const n = state.c.groupCount;
  const k = 1 + randomInt(rng, Math.min(n, MAX_KICK_GROUPS));
  const picked = shuffled(rng, n).slice(0, k);
  picked.forEach((g) => state.unplace(g));
  for (const g of picked) {
    const slots = state.c.cost[g].length;
    tick(ctx, Math.max(1, slots));
    const legal: number[] = [];
    for (let s = 0; s < slots; s++) if (state.canPlace(g, s)) legal.push(s);
    if (legal.length > 0) state.place(g, legal[randomInt(rng, legal.length)]);
  }
}

/**
 * Forces a random unscheduled group onto a random slot of its own, taking out every group in the way; the descent
 * that follows tries to put those back elsewhere. False when no unscheduled group has a slot.
 */
function forcedInsertKick(ctx: SearchCtx): boolean {
  const { state, rng } = ctx;
  const waiting = [];
  for (let g = 0; g < state.c.groupCount; g++) if (state.assign[g] === UNSCHEDULED && state.c.cost[g].length > 0) waiting.push(g);
  if (waiting.length === 0) return false;
  tick(ctx);
  const g = waiting[randomInt(rng, waiting.length)];
  const s = randomInt(rng, state.c.cost[g].length);
  const b = state.blockers(g, s);
  [...b.spacing, ...b.clash].forEach((h) => state.unplace(h));
  if (state.blockers(g, s).nightFull) {
    const onNight = state.groupsOnNight(state.c.night[g][s], g);
    state.unplace(onNight[randomInt(rng, onNight.length)]);
  }
  state.place(g, s);
  return true;
}

/** Perturbs the schedule, then searches on from it; only groups the kick may have affected are examined first. */
function kickAndDescend(ctx: SearchCtx): void {
  const before = ctx.state.snapshot();
  if (!(ctx.rng() < FORCED_INSERT_SHARE && forcedInsertKick(ctx))) randomKick(ctx);
  const start: number[] = [];
  queueAffected(ctx, before, (g) => start.push(g));
  descend(ctx, [...new Set(start)]);
}

/** No schedule costs less than every group on its cheapest slot (and the penalty for a group with none). */
function lowerBound(state: CampaignState): number {
  return state.c.cost.reduce((sum, costs) => sum + (costs.length === 0 ? UNSCHEDULED_PENALTY : Math.min(...costs)), 0);
}

/** Improves `ctx.state` in place from where it stands; leaves the best schedule found in it. */
export function localSearch(ctx: SearchCtx): void {
  const { state } = ctx;
  if (state.c.groupCount === 0) return;
  const bound = lowerBound(state);
  let best = state.snapshot();
  let bestObjective = state.objective();
  let sinceBest = 0;
  for (let first = true; !spent(ctx) && bestObjective > bound + EPS && sinceBest < STALL_KICKS; first = false) {
    if (first) descend(ctx, Array.from({ length: state.c.groupCount }, (_, g) => g));
    else kickAndDescend(ctx);
    const objective = state.objective();
    if (objective < bestObjective - EPS) {
      best = state.snapshot();
      bestObjective = objective;
      sinceBest = 0;
    } else {
      sinceBest++;
      if (objective > bestObjective + ACCEPT_WORSE_BY || sinceBest % RETURN_TO_BEST_AFTER === 0) state.restore(best);
    }
  }
  state.restore(best);
  ctx.onProgress?.(ctx.counters.iterations, ctx.maxIterations);
}
