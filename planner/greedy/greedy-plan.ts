// Greedy reference solver: sites ranked by GRC on the residual network; each affected slice (priority order)
// takes its current site where it still fits, else the best-ranked candidate, and its ties are routed by
// the decoder's own kernel — so the greedy plan is exactly reproducible as a DE seed.
import type { SlicePlacement } from '../model/types';
import { fits } from '../model/tolerance';
import { createBookingState, placeSlice, releaseHeld, type BookingState } from '../remap/booking';
import type { RemapProblem, RemapSlice } from '../remap/remap-types';
import { grcRank } from './grc';

export interface GreedyResult {
  next: Map<number, SlicePlacement | null>;
  /** genes that decode to `next` */
  genes: Float64Array;
}

type Choice = 'ranked' | 'nearest';

/** Stay put when the current site still fits; else the best-ranked (or nearest) fitting candidate; -1 if none. */
function pickCandidate(candidates: Int32Array, current: number, free: (site: number) => boolean, rank: Float64Array, how: Choice): number {
  if (candidates[0] === current && free(current)) return 0;
  let best = -1;
  for (let i = 0; i < candidates.length; i += 1) {
    if (!free(candidates[i])) continue;
    if (how === 'nearest') return i;
    if (best < 0 || rank[candidates[i]] > rank[candidates[best]]) best = i;
  }
  return best;
}

/** A candidate index per function that fits the CPU left (functions of the slice counted together), or null. */
function chooseSites(problem: RemapProblem, state: BookingState, block: RemapSlice, rank: Float64Array, how: Choice): number[] | null {
  const taken = new Map<number, number>();
  const picks: number[] = [];
  for (const k of block.functions) {
    const f = problem.functions[k];
    const cpu = problem.inv.slices[f.slice].functions[f.fn].cpu;
    const free = (site: number) => fits(cpu + (taken.get(site) ?? 0), state.cpu[site]);
    const best = pickCandidate(f.candidates, problem.inv.placements[f.slice].sites[f.fn], free, rank, how);
    if (best < 0) return null;
    taken.set(f.candidates[best], (taken.get(f.candidates[best]) ?? 0) + cpu);
    picks.push(best);
  }
  return picks;
}

function snapshot(state: BookingState): BookingState {
  return { ...state, cpu: Float64Array.from(state.cpu), gbps: Float64Array.from(state.gbps), protectedGbps: Float64Array.from(state.protectedGbps) };
}

function restore(state: BookingState, saved: BookingState): void {
  const { cpu, gbps, protectedGbps, pathOptions, protectedOptions } = state;
  cpu.set(saved.cpu);
  gbps.set(saved.gbps);
  protectedGbps.set(saved.protectedGbps);
  Object.assign(state, saved, { cpu, gbps, protectedGbps, pathOptions, protectedOptions });
}

/** Tries the ranked choice, then the nearest one; keeps the first that books without any violation. */
function placeGreedily(problem: RemapProblem, state: BookingState, block: RemapSlice, rank: Float64Array): { picks: number[]; placement: SlicePlacement } | null {
  const sites = new Int32Array(block.functions.length);
  for (const how of ['ranked', 'nearest'] as const) {
    const picks = chooseSites(problem, state, block, rank, how);
    if (picks === null) continue;
    picks.forEach((p, fn) => { sites[fn] = problem.functions[block.functions[fn]].candidates[p]; });
    const saved = snapshot(state);
    const placement = placeSlice(problem, state, block, sites, true);
    if (state.violation === saved.violation && placement) return { picks, placement };
    restore(state, saved);
  }
  return null;
}

export function greedyPlan(problem: RemapProblem): GreedyResult {
  const state = createBookingState(problem);
  const rank = grcRank(problem.inv.network, state.cpu, state.gbps);
  const next = new Map<number, SlicePlacement | null>();
  const genes = new Float64Array(problem.dimension).fill(0.5);
  for (const block of problem.slices) {
    const placed = block.blockedReason === undefined ? placeGreedily(problem, state, block, rank) : null;
    if (!placed) releaseHeld(state, block);
    genes[block.keepGene] = placed ? 0.75 : 0.25;
    next.set(block.slice, placed ? placed.placement : null);
    placed?.picks.forEach((p, fn) => { genes[problem.functions[block.functions[fn]].gene] = p + 0.5; });
  }
  return { next, genes };
}
