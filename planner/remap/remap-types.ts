// Shapes of the re-mapping problem: options, candidate lists, residual capacities and the genome layout.
import type { DEProblem } from '../de/differential-evolution';
import type { Inventory, Reservation, WindowSpec } from '../model/types';

/** Serializable options that, with the inventory and window, determine the problem exactly. */
export interface RemapProblemOptions {
  reservations?: Reservation;
  /** function ids kept on their current site */
  pinned?: string[];
  /** site ids no affected function may move to */
  excludedSites?: string[];
  /** at most this many candidate sites per function (current site included) */
  maxCandidates?: number;
  /** knock-on moves of slices the window does not touch; absent = touched slices only */
  knockOn?: { maxMoves: number };
}

/** One affected function: where it may go. */
export interface RemapFunction {
  slice: number;
  fn: number;
  /** candidate site indices; index 0 is the current site when it is still usable */
  candidates: Int32Array;
  /** genome position of this function's gene */
  gene: number;
}

/** One affected slice and its genome block. */
export interface RemapSlice {
  slice: number;
  /** genome position of the keep-out gene (< 0.5 = leave the slice unresolved) */
  keepGene: number;
  /** indices into RemapProblem.functions, in the slice's function order */
  functions: number[];
  /** why no decode can place it (a function without candidates), else undefined */
  blockedReason?: string;
  /** spans of its ties' current paths that survive the window (repeats allowed) and the Gbps each holds */
  heldSpans: Int32Array;
  heldGbps: Float64Array;
}

export interface RemapProblem extends Omit<DEProblem, 'evaluate'> {
  inv: Inventory;
  window: WindowSpec;
  options: RemapProblemOptions;
  /** affected slice indices, ascending */
  affected: number[];
  slices: RemapSlice[];
  functions: RemapFunction[];
  /** capacity left during the window for the affected slices */
  residualCpu: Float64Array;
  residualGbps: Float64Array;
  /** residualGbps minus every affected tie's surviving current path: new routes try this first */
  protectedGbps: Float64Array;
  /** window capacity without reservations, for utilisation */
  capacityGbps: Float64Array;
  siteDown: Uint8Array;
  spanDown: Uint8Array;
  /** highest span utilisation from load the plan does not touch */
  basePeakUtilisation: number;
}
