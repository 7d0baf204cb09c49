// Shapes of the re-mapping problem: options, candidate lists, residual capacities and the genome layout.
import type { DEProblem } from '../de/differential-evolution';
import type { Inventory, Reservation, WindowSpec } from '../model/types';
import type { PathCatalog } from './path-catalog';

/** Serializable options that, with the inventory and window, determine the problem exactly. */
export interface RemapProblemOptions {
  reservations?: Reservation;
  /** function ids kept on their current site */
  pinned?: string[];
  /** site ids no affected function may move to */
  excludedSites?: string[];
  /** at most this many candidate sites per function (current site included) */
  maxCandidates?: number;
  /** candidate paths per tie and pair of end sites (current path included) */
  kPaths?: number;
  /**
   * knock-on moves of slices the window does not touch: at most `maxMoves` of them per plan, chosen among
   * `maxCandidates` slices that sit on the elements blocking touched slices; absent = touched slices only
   */
  knockOn?: { maxMoves: number; maxCandidates?: number };
}

/** One function of a block: where it may go. */
export interface RemapFunction {
  slice: number;
  fn: number;
  /** candidate site indices; index 0 is the current site when it is still usable */
  candidates: Int32Array;
  /** genome position of this function's gene, in [0, candidates) */
  gene: number;
}

/** One tie of a block: its path gene picks among the catalogue's paths between the chosen end sites. */
export interface RemapTie {
  slice: number;
  tie: number;
  /** genome position of this tie's gene, in [0, kPaths) */
  gene: number;
}

/** One slice of the problem and its genome block: [keep (touched only), order, functions…, ties…]. */
export interface RemapSlice {
  slice: number;
  /** the window touches it (hosted, transit, squeezed); false = a knock-on candidate */
  touched: boolean;
  /** genome position of the keep-out gene (< 0.5 = leave the slice unresolved); -1 for knock-on candidates */
  keepGene: number;
  /** genome position of the random key that sets the decode order (smaller keys claim first) */
  orderGene: number;
  /** indices into RemapProblem.functions, in the slice's function order */
  functions: number[];
  /** indices into RemapProblem.ties, in the slice's tie order */
  ties: number[];
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
  /** slice indices the window touches, ascending */
  affected: number[];
  /** blocks: knock-on candidates first, then touched slices by priority (the stay-put decode order) */
  slices: RemapSlice[];
  functions: RemapFunction[];
  ties: RemapTie[];
  /** most knock-on candidates that may leave their current placement in one plan (0 = none) */
  maxKnockOnMoves: number;
  kPaths: number;
  paths: PathCatalog;
  /** capacity left during the window for the blocks */
  residualCpu: Float64Array;
  residualGbps: Float64Array;
  /** residualGbps minus every block's surviving current path: fallback routes try this first */
  protectedGbps: Float64Array;
  /** window capacity without reservations, for utilisation */
  capacityGbps: Float64Array;
  siteDown: Uint8Array;
  spanDown: Uint8Array;
  /** highest span utilisation from load the plan does not touch */
  basePeakUtilisation: number;
}
