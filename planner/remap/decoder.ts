// Genome → placements: floors each function gene to a candidate site and books slices in priority order.
import type { DEProblem, Fitness } from '../de/differential-evolution';
import type { Objective, SlicePlacement } from '../model/types';
import { sliceWeight } from '../plan/evaluate-plan';
import { createBookingState, loadBookingState, placeSlice, releaseHeld, resetBookingState, saveBookingState, type BookingState } from './booking';
import type { RemapProblem } from './remap-types';

/** Genes at the middle of their cell, so small DE steps do not flip them. */
const KEEP_IN = 0.75;
const LEAVE_OUT = 0.25;
const CELL_MIDDLE = 0.5;

export interface Decoded {
  fitness: Fitness;
  next: Map<number, SlicePlacement | null>;
  objective: Objective;
}

export interface Decoder {
  evaluate(genes: Float64Array): Fitness;
  decode(genes: Float64Array): Decoded;
  /** evaluate, saving the booking state before each slice block for evaluateFrom */
  evaluateSaving(genes: Float64Array): Fitness;
  /**
   * evaluate for genes that equal those of the last evaluateSaving call in every block before `block`:
   * decodes only from that block on (same result as evaluate).
   */
  evaluateFrom(genes: Float64Array, block: number): Fitness;
}

/** Objective vector order: the lexicographic keys, then counts as tie-breakers (fewer is better there too). */
function toFitness(s: BookingState): Fitness {
  return {
    objective: [s.unresolvedWeight, s.moveCost, s.usage, s.peakUtilisation, s.unresolved, s.moved, s.rerouted],
    violation: s.violation,
  };
}

export function objectiveFromFitness(f: Fitness): Objective {
  const [unresolvedWeight, moveCost, usage, peakUtilisation, unresolved, moved, rerouted] = f.objective;
  return { unresolvedWeight, unresolved, moved, rerouted, moveCost, usage, peakUtilisation };
}

function candidateIndex(gene: number, count: number): number {
  const i = Math.floor(gene);
  return i < 0 ? 0 : i >= count ? count - 1 : i;
}

/** Partial decodes: the booking state before each slice block, saved by a full pass. */
interface Resume {
  /** start at this block from saves[from] (0 = from scratch) */
  from: number;
  saves: Float64Array[];
  /** save the state before each block into saves */
  save: boolean;
}

function run(problem: RemapProblem, state: BookingState, sites: Int32Array, genes: Float64Array, next?: Map<number, SlicePlacement | null>, resume?: Resume): void {
  const from = resume?.from ?? 0;
  if (from > 0 && resume) loadBookingState(state, resume.saves[from]);
  else resetBookingState(problem, state);
  const record = next !== undefined;
  for (let b = from; b < problem.slices.length; b += 1) {
    const block = problem.slices[b];
    if (resume?.save) resume.saves[b] = saveBookingState(state, resume.saves[b]);
    if (block.blockedReason !== undefined || genes[block.keepGene] < 0.5) {
      releaseHeld(state, block);
      state.unresolvedWeight += sliceWeight(problem.inv.slices[block.slice].priority);
      state.unresolved += 1;
      next?.set(block.slice, null);
      continue;
    }
    block.functions.forEach((k, fn) => {
      const f = problem.functions[k];
      sites[fn] = f.candidates[candidateIndex(genes[f.gene], f.candidates.length)];
    });
    const placement = placeSlice(problem, state, block, sites, record);
    next?.set(block.slice, placement);
  }
}

/** A decoder with its own scratch buffers (one per thread; not re-entrant). */
export function createDecoder(problem: RemapProblem): Decoder {
  const state = createBookingState(problem);
  let widest = 1;
  for (const block of problem.slices) widest = Math.max(widest, block.functions.length);
  const sites = new Int32Array(widest);
  const saves: Float64Array[] = [];
  return {
    evaluateSaving(genes) {
      run(problem, state, sites, genes, undefined, { from: 0, saves, save: true });
      return toFitness(state);
    },
    evaluateFrom(genes, block) {
      // Without saved states (no evaluateSaving yet) this is a plain evaluate.
      run(problem, state, sites, genes, undefined, { from: saves.length === problem.slices.length ? block : 0, saves, save: false });
      return toFitness(state);
    },
    evaluate(genes) {
      run(problem, state, sites, genes);
      return toFitness(state);
    },
    decode(genes) {
      const next = new Map<number, SlicePlacement | null>();
      run(problem, state, sites, genes, next);
      const fitness = toFitness(state);
      return { fitness, next, objective: objectiveFromFitness(fitness) };
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

/** Every slice kept, every function on candidate 0 (its current site whenever that is still usable). */
export function stayPutGenes(problem: RemapProblem): Float64Array {
  const genes = new Float64Array(problem.dimension).fill(CELL_MIDDLE);
  for (const block of problem.slices) genes[block.keepGene] = KEEP_IN;
  return genes;
}

/** Genes that decode to `next`'s sites (slices missing from `next` stay put; null = left out). */
export function genesFromPlacement(problem: RemapProblem, next: Map<number, SlicePlacement | null>): Float64Array {
  const genes = stayPutGenes(problem);
  for (const block of problem.slices) {
    const placement = next.get(block.slice);
    if (placement === undefined) continue;
    if (placement === null) {
      genes[block.keepGene] = LEAVE_OUT;
      continue;
    }
    for (const k of block.functions) {
      const f = problem.functions[k];
      const i = f.candidates.indexOf(placement.sites[f.fn]);
      genes[f.gene] = (i < 0 ? 0 : i) + CELL_MIDDLE;
    }
  }
  return genes;
}
