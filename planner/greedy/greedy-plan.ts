// Greedy reference solver: sites ranked by GRC on the residual network; each touched slice (priority order)
// takes its current site where it still fits, else the best-ranked candidate (then the nearest), and its ties are
// routed by the decoder's own kernel on their first catalogue path that fits — so the greedy plan is exactly
// reproducible as a DE seed. Knock-on candidates stay where they are: greedy makes no knock-on moves.
import type { SlicePlacement } from '../model/types';
import { fits } from '../model/tolerance';
import { createClaimState, releaseHeld, type ClaimState } from '../remap/claims';
import { CELL_MIDDLE, KEEP_IN, LEAVE_OUT, stayPutGenes } from '../remap/decoder';
import { claimPlacement, placeSlice } from '../remap/place-slice';
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
function chooseSites(problem: RemapProblem, state: ClaimState, block: RemapSlice, rank: Float64Array, how: Choice): number[] | null {
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

/** Tries the ranked choice, then the nearest one; writes the first that places into `genes`. */
function placeGreedily(problem: RemapProblem, state: ClaimState, block: RemapSlice, rank: Float64Array, genes: Float64Array): SlicePlacement | null {
  const sites = new Int32Array(block.functions.length);
  for (const how of ['ranked', 'nearest'] as const) {
    const picks = chooseSites(problem, state, block, rank, how);
    if (picks === null) continue;
    picks.forEach((p, fn) => { genes[problem.functions[block.functions[fn]].gene] = p + CELL_MIDDLE; });
    const placed = placeSlice(problem, state, block, genes, sites);
    if (placed) return placed;
  }
  return null;
}

export function greedyPlan(problem: RemapProblem): GreedyResult {
  const state = createClaimState(problem);
  const rank = grcRank(problem.inv.network, state.cpu, state.gbps);
  const next = new Map<number, SlicePlacement | null>();
  const genes = stayPutGenes(problem);
  for (const block of problem.slices) {
    releaseHeld(state, block);
    if (!block.touched) {
      claimPlacement(problem, state, block.slice, problem.inv.placements[block.slice]);
      next.set(block.slice, problem.inv.placements[block.slice]);
      continue;
    }
    const placed = block.blockedReason === undefined ? placeGreedily(problem, state, block, rank, genes) : null;
    genes[block.keepGene] = placed ? KEEP_IN : LEAVE_OUT;
    if (!placed) for (const k of block.functions) genes[problem.functions[k].gene] = CELL_MIDDLE;
    next.set(block.slice, placed);
  }
  return { next, genes };
}
