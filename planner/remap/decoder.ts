// Genome → placements: orders the blocks by their random keys and claims each on the sites and paths its genes
// pick. A touched slice that cannot be placed whole is left unresolved; an untouched (knock-on) slice that
// cannot be re-placed, or would exceed the knock-on cap, keeps its current placement.
import type { DEProblem, Fitness } from '../de/differential-evolution';
import type { Objective, SlicePlacement } from '../model/types';
import { sliceWeight } from '../plan/evaluate-plan';
import { createClaimState, loadClaimState, releaseHeld, resetClaimState, saveClaimState, type ClaimState } from './claims';
import { claimPlacement, placeSlice } from './place-slice';
import type { RemapProblem, RemapSlice } from './remap-types';

/** Genes at the middle of their cell, so small DE steps do not flip them. */
export const KEEP_IN = 0.75;
export const LEAVE_OUT = 0.25;
export const CELL_MIDDLE = 0.5;

export interface Decoded {
  fitness: Fitness;
  next: Map<number, SlicePlacement | null>;
  objective: Objective;
}

export interface Decoder {
  evaluate(genes: Float64Array): Fitness;
  decode(genes: Float64Array): Decoded;
  /** evaluate, saving the claim state before each decode position for evaluateFrom */
  evaluateSaving(genes: Float64Array): Fitness;
  /**
   * evaluate for genes that differ from those of the last evaluateSaving call only in the blocks listed:
   * decodes from the first position where anything can differ (same result as evaluate).
   */
  evaluateFrom(genes: Float64Array, changedBlocks: readonly number[]): Fitness;
  /** block indices in the decode order of `genes` (a fresh array) */
  orderOf(genes: Float64Array): number[];
}

/** Objective vector order: the lexicographic keys, then counts as tie-breakers (fewer is better there too). */
function toFitness(s: ClaimState): Fitness {
  return {
    objective: [s.unresolvedWeight, s.moveCost, s.usage, s.peakUtilisation, s.unresolved, s.moved, s.rerouted],
    violation: s.violation,
  };
}

export function objectiveFromFitness(f: Fitness): Objective {
  const [unresolvedWeight, moveCost, usage, peakUtilisation, unresolved, moved, rerouted] = f.objective;
  return { unresolvedWeight, unresolved, moved, rerouted, moveCost, usage, peakUtilisation };
}

/** Sorts `order` (block indices) by the blocks' keys; block index breaks ties, so the order is deterministic. */
function sortByKeys(problem: RemapProblem, genes: Float64Array, order: Int32Array): void {
  for (let b = 0; b < order.length; b += 1) order[b] = b;
  const key = (b: number) => genes[problem.slices[b].orderGene];
  order.sort((a, b) => key(a) - key(b) || a - b);
}

function decodeBlock(problem: RemapProblem, state: ClaimState, block: RemapSlice, genes: Float64Array, sites: Int32Array): SlicePlacement | null {
  releaseHeld(state, block);
  if (block.touched) {
    const placed = block.blockedReason === undefined && genes[block.keepGene] >= 0.5 ? placeSlice(problem, state, block, genes, sites) : null;
    if (placed === null) {
      state.unresolvedWeight += sliceWeight(problem.inv.slices[block.slice].priority);
      state.unresolved += 1;
    }
    return placed;
  }
  const mayMove = block.blockedReason === undefined && state.knockOnMoves < problem.maxKnockOnMoves;
  const placed = mayMove ? placeSlice(problem, state, block, genes, sites) : null;
  if (placed !== null) return placed;
  const current = problem.inv.placements[block.slice];
  claimPlacement(problem, state, block.slice, current);
  return current;
}

interface Run {
  order: Int32Array;
  from: number;
  saves?: Float64Array[];
  next?: Map<number, SlicePlacement | null>;
}

function run(problem: RemapProblem, state: ClaimState, sites: Int32Array, genes: Float64Array, r: Run): void {
  if (r.from > 0 && r.saves) loadClaimState(state, r.saves[r.from]);
  else resetClaimState(problem, state);
  for (let p = r.from; p < r.order.length; p += 1) {
    if (r.saves && r.from === 0) r.saves[p] = saveClaimState(state, r.saves[p]);
    const block = problem.slices[r.order[p]];
    const placed = decodeBlock(problem, state, block, genes, sites);
    r.next?.set(block.slice, placed);
  }
}

/** A decoder with its own scratch buffers (one per thread; not re-entrant). */
export function createDecoder(problem: RemapProblem): Decoder {
  const state = createClaimState(problem);
  let widest = 1;
  for (const block of problem.slices) widest = Math.max(widest, block.functions.length);
  const sites = new Int32Array(widest);
  const n = problem.slices.length;
  const order = new Int32Array(n);
  const savedOrder = new Int32Array(n);
  const position = new Int32Array(n);
  const saves: Float64Array[] = [];
  let haveSaves = false;
  return {
    evaluateSaving(genes) {
      sortByKeys(problem, genes, order);
      run(problem, state, sites, genes, { order, from: 0, saves });
      savedOrder.set(order);
      haveSaves = true;
      return toFitness(state);
    },
    evaluateFrom(genes, changedBlocks) {
      sortByKeys(problem, genes, order);
      let from = 0;
      if (haveSaves) {
        for (let p = 0; p < n; p += 1) position[order[p]] = p;
        from = n;
        for (const b of changedBlocks) from = Math.min(from, position[b]);
        for (let p = 0; p < from; p += 1) if (order[p] !== savedOrder[p]) { from = p; break; }
      }
      run(problem, state, sites, genes, { order, from: from >= n ? n : from, saves: haveSaves ? saves : undefined });
      return toFitness(state);
    },
    evaluate(genes) {
      sortByKeys(problem, genes, order);
      run(problem, state, sites, genes, { order, from: 0 });
      return toFitness(state);
    },
    decode(genes) {
      const next = new Map<number, SlicePlacement | null>();
      sortByKeys(problem, genes, order);
      run(problem, state, sites, genes, { order, from: 0, next });
      const fitness = toFitness(state);
      return { fitness, next, objective: objectiveFromFitness(fitness) };
    },
    orderOf(genes) {
      sortByKeys(problem, genes, order);
      return Array.from(order);
    },
  };
}

export function decode(problem: RemapProblem, genes: Float64Array): Decoded {
  return createDecoder(problem).decode(genes);
}

/** The problem as DE sees it: bounds plus an allocation-light evaluator. */
export function toDEProblem(problem: RemapProblem, decoder: Decoder = createDecoder(problem)): DEProblem {
  return { dimension: problem.dimension, lower: problem.lower, upper: problem.upper, evaluate: (x) => decoder.evaluate(x) };
}

/** Order keys in the problem's block order: knock-on candidates first, then touched slices by priority. */
function baseOrderKey(problem: RemapProblem, b: number): number {
  return (b + 0.5) / Math.max(1, problem.slices.length);
}

/** Every touched slice kept, every function on candidate 0 (its current site when usable), every tie on path 0. */
export function stayPutGenes(problem: RemapProblem): Float64Array {
  const genes = new Float64Array(problem.dimension).fill(CELL_MIDDLE);
  problem.slices.forEach((block, b) => {
    if (block.keepGene >= 0) genes[block.keepGene] = KEEP_IN;
    genes[block.orderGene] = baseOrderKey(problem, b);
  });
  return genes;
}

/** The gene value that picks catalogue path `spans` for a tie between `from` and `to` (path 0 when not listed). */
export function pathGene(problem: RemapProblem, slice: number, tie: number, from: number, to: number, spans: readonly number[]): number {
  const i = problem.paths.get(slice, tie, from, to).indexOf(spans);
  return (i < 0 ? 0 : i) + CELL_MIDDLE;
}

/**
 * Genes that decode to `next` whenever its placements fit together and use catalogue paths (blocks missing from
 * `next` stay put; null = left out). The order keys are the problem's base order.
 */
export function genesFromPlacement(problem: RemapProblem, next: Map<number, SlicePlacement | null>): Float64Array {
  const genes = stayPutGenes(problem);
  for (const block of problem.slices) {
    const placement = next.get(block.slice);
    if (placement === undefined) continue;
    if (placement === null) {
      if (block.keepGene >= 0) genes[block.keepGene] = LEAVE_OUT;
      continue;
    }
    for (const k of block.functions) {
      const f = problem.functions[k];
      const i = f.candidates.indexOf(placement.sites[f.fn]);
      genes[f.gene] = (i < 0 ? 0 : i) + CELL_MIDDLE;
    }
    for (const k of block.ties) {
      const t = problem.ties[k];
      const info = problem.inv.slices[t.slice].ties[t.tie];
      genes[t.gene] = pathGene(problem, t.slice, t.tie, placement.sites[info.from], placement.sites[info.to], placement.paths[t.tie]);
    }
  }
  return genes;
}
