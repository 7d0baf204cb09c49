// The local search's improving steps on a campaign schedule, each counted against the search budget: a group
// moves to a cheaper legal slot, two groups exchange nights, an unscheduled group goes in (directly, or after
// moving the one group blocking a slot: an ejection chain of depth 1).
import { type Rng, randomInt } from '../random/rng';
import { type CampaignState, UNSCHEDULED } from './campaign-state';
import { cheapestLegalSlot } from './construct';
import { UNSCHEDULED_PENALTY } from './types';

/** Objective changes smaller than this (points) are rounding, not improvement. */
export const EPS = 1e-7;
const PROGRESS_EVERY = 1000;

export interface SearchCounters {
  iterations: number;
  moves: number;
}

export interface SearchCtx {
  state: CampaignState;
  rng: Rng;
  counters: SearchCounters;
  maxIterations: number;
  onProgress?: (done: number, total: number) => void;
}

/** Counts one evaluated candidate; false once the budget is spent. */
export function tick(ctx: SearchCtx, n = 1): boolean {
  const before = ctx.counters.iterations;
  ctx.counters.iterations = Math.min(ctx.maxIterations, before + n);
  if (ctx.onProgress && Math.floor(before / PROGRESS_EVERY) !== Math.floor(ctx.counters.iterations / PROGRESS_EVERY)) {
    ctx.onProgress(ctx.counters.iterations, ctx.maxIterations);
  }
  return before < ctx.maxIterations;
}

export const spent = (ctx: SearchCtx) => ctx.counters.iterations >= ctx.maxIterations;

export function shuffled(rng: Rng, n: number): number[] {
  const order = Array.from({ length: n }, (_, i) => i);
  for (let i = n - 1; i > 0; i--) {
    const j = randomInt(rng, i + 1);
    [order[i], order[j]] = [order[j], order[i]];
  }
  return order;
}

/** A scheduled group takes its cheapest legal slot when that is cheaper than where it is. */
export function tryMove(ctx: SearchCtx, g: number): boolean {
  const { state } = ctx;
  const cost = state.c.cost[g];
  const cur = state.assign[g];
  const cheaper: number[] = [];
  for (let s = 0; s < cost.length; s++) if (cost[s] < cost[cur] - EPS) cheaper.push(s);
  if (cheaper.length === 0 || !tick(ctx, cheaper.length)) return false;
  const s = cheapestLegalSlot(state, g, cheaper);
  if (s < 0) return false;
  state.place(g, s);
  ctx.counters.moves++;
  return true;
}

/** g and one other scheduled group exchange nights, each on its cheapest legal slot there, when that is cheaper. */
export function trySwap(ctx: SearchCtx, g: number): boolean {
  const { state } = ctx;
  const { c } = state;
  for (let h = 0; h < c.groupCount; h++) {
    const a = state.assign[g];
    const b = state.assign[h];
    if (h === g || b === UNSCHEDULED || c.night[g][a] === c.night[h][b]) continue;
    const onNightOfH = c.slotsByNight[g].get(c.night[h][b]);
    const onNightOfG = c.slotsByNight[h].get(c.night[g][a]);
    if (!onNightOfH || !onNightOfG) continue;
    if (!tick(ctx)) return false;
    const before = c.cost[g][a] + c.cost[h][b];
    state.unplace(g);
    state.unplace(h);
    const sa = cheapestLegalSlot(state, g, onNightOfH);
    if (sa >= 0) state.place(g, sa);
    const sb = sa >= 0 ? cheapestLegalSlot(state, h, onNightOfG) : -1;
    if (sb >= 0 && c.cost[g][sa] + c.cost[h][sb] < before - EPS) {
      state.place(h, sb);
      ctx.counters.moves++;
      return true;
    }
    state.place(g, a);
    state.place(h, b);
  }
  return false;
}

/** The groups whose moving away alone would free slot s for unscheduled g ([] when no single one would). */
function soleBlockers(state: CampaignState, g: number, s: number): number[] {
  const b = state.blockers(g, s);
  const others = [...new Set([...b.spacing, ...b.clash])];
  if (others.length > 1) return [];
  const night = state.c.night[g][s];
  if (others.length === 1) {
    const h = others[0];
    return !b.nightFull || state.c.night[h][state.assign[h]] === night ? [h] : [];
  }
  return b.nightFull ? state.groupsOnNight(night, g) : [];
}

interface Ejection { delta: number; s: number; h: number; to: number }

/** Unscheduled g goes in: on its cheapest legal slot, or on a slot freed by moving (or, if cheaper, dropping) one blocker. */
export function tryInsert(ctx: SearchCtx, g: number): boolean {
  const { state } = ctx;
  const { cost } = state.c;
  const slots = cost[g].length;
  if (slots === 0 || !tick(ctx, slots)) return false;
  const direct = cheapestLegalSlot(state, g);
  if (direct >= 0) {
    state.place(g, direct);
    ctx.counters.moves++;
    return true;
  }
  let best: Ejection | null = null;
  for (let s = 0; s < slots && !spent(ctx); s++) {
    for (const h of soleBlockers(state, g, s)) {
      if (!tick(ctx)) break;
      const from = state.assign[h];
      state.unplace(h);
      if (state.canPlace(g, s)) {
        state.place(g, s);
        const to = cheapestLegalSlot(state, h);
        const delta = cost[g][s] + (to >= 0 ? cost[h][to] : UNSCHEDULED_PENALTY) - cost[h][from] - UNSCHEDULED_PENALTY;
        if (delta < (best?.delta ?? 0) - EPS) best = { delta, s, h, to };
        state.unplace(g);
      }
      state.place(h, from);
    }
  }
  if (!best) return false;
  state.unplace(best.h);
  state.place(g, best.s);
  if (best.to >= 0) state.place(best.h, best.to);
  ctx.counters.moves++;
  return true;
}
