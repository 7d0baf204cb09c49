// Genome → placements: orders the blocks by their random keys and claims each on the sites and paths its genes
// pick. A touched slice that cannot be placed whole is left unresolved; an untouched (knock-on) slice that
// cannot be re-placed, or would exceed the knock-on cap, keeps its current placement.
import type { DEProblem, Fitness } from '../de/differential-evolution';
import type { Objective, SlicePlacement } from '../model/types';
import { sliceWeight } from '../plan/evaluate-plan';
import { fits } from '../model/tolerance';
import {
  createClaimState, loadClaimState, newBlockRecord, releaseHeld, resetClaimState, saveClaimState,
  STEP_CPU_CHECK, STEP_CPU_CLAIM, STEP_GBPS_CHECK, STEP_SPAN_CLAIM, type BlockRecord, type ClaimState,
} from './claims';
import { claimPlacement, placeSlice, replayAttempt } from './place-slice';
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
  /**
   * evaluate, keeping a log of every block's decode (written into `into` when given). With the log of `parent`,
   * blocks whose own genes are unchanged and whose recorded capacity checks still come out the same are replayed
   * from the parent's log instead of decoded: the same fitness as evaluate, with no path searches for them.
   */
  evaluateLogged(genes: Float64Array, parent: DecodeLog | null, into?: DecodeLog): { fitness: Fitness; log: DecodeLog };
}

/** One decode of a genome, block by block (see Decoder.evaluateLogged). */
export interface DecodeLog {
  /** a copy of the genes decoded */
  genes: Float64Array;
  /** by block index; records are shared between logs, never changed once made */
  records: BlockRecord[];
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

/** Whether an untouched block may be moved now: not blocked, and the knock-on cap not reached. */
function mayMoveNow(problem: RemapProblem, state: ClaimState, block: RemapSlice): boolean {
  return block.blockedReason === undefined && state.knockOnMoves < problem.maxKnockOnMoves;
}

/** After the placement attempt (or none): unresolved for a touched block, kept where it is for an untouched one. */
function settle(problem: RemapProblem, state: ClaimState, block: RemapSlice, placed: SlicePlacement | null): SlicePlacement | null {
  if (block.touched) {
    if (placed === null) {
      state.unresolvedWeight += sliceWeight(problem.inv.slices[block.slice].priority);
      state.unresolved += 1;
    }
    return placed;
  }
  if (placed !== null) return placed;
  const current = problem.inv.placements[block.slice];
  claimPlacement(problem, state, block.slice, current);
  return current;
}

/** Decodes one block whose held paths are already released; records into `rec` when given. */
function decodeReleased(problem: RemapProblem, state: ClaimState, block: RemapSlice, genes: Float64Array, sites: Int32Array, rec: BlockRecord | null): SlicePlacement | null {
  let attempt: boolean;
  if (block.touched) attempt = block.blockedReason === undefined && genes[block.keepGene] >= 0.5;
  else {
    attempt = mayMoveNow(problem, state, block);
    if (rec) rec.mayMove = attempt;
  }
  state.rec = rec;
  const placed = attempt ? placeSlice(problem, state, block, genes, sites) : null;
  state.rec = null;
  return settle(problem, state, block, placed);
}

function decodeBlock(problem: RemapProblem, state: ClaimState, block: RemapSlice, genes: Float64Array, sites: Int32Array): SlicePlacement | null {
  releaseHeld(state, block);
  return decodeReleased(problem, state, block, genes, sites, null);
}

/**
 * Scratch for replayHolds: the block's own claims so far, as (kind, index, amount) triples, and per site and span
 * the pass that last claimed it (so a check on an element the block has not claimed skips the scan).
 */
const pending: number[] = [];
let pendingCpu = new Uint32Array(0);
let pendingSpan = new Uint32Array(0);
let pass = 0;
// Local copies of the step kinds: read in the hottest loop, where an imported binding may cost a property read.
const CPU_CHECK = STEP_CPU_CHECK;
const GBPS_CHECK = STEP_GBPS_CHECK;
const CPU_CLAIM = STEP_CPU_CLAIM;
const SPAN_CLAIM = STEP_SPAN_CLAIM;

function nextPass(state: ClaimState): void {
  if (pendingCpu.length !== state.cpu.length) pendingCpu = new Uint32Array(state.cpu.length);
  if (pendingSpan.length !== state.gbps.length) pendingSpan = new Uint32Array(state.gbps.length);
  pass += 1;
  if (pass === 0xffffffff) {
    pendingCpu.fill(0);
    pendingSpan.fill(0);
    pass = 1;
  }
  pending.length = 0;
}

/**
 * Whether a recorded decode of the block (held paths already released) would decide the same in `state`: every
 * capacity check gives the same answer on the values it would read now, including the block's own earlier claims
 * (subtracted in the same order, so the arithmetic is the decode's own). Then replaying it is exact.
 */
function replayHolds(problem: RemapProblem, state: ClaimState, block: RemapSlice, rec: BlockRecord): boolean {
  if (!block.touched && mayMoveNow(problem, state, block) !== rec.mayMove) return false;
  const steps = rec.steps;
  const { cpu, gbps, protectedGbps } = state;
  nextPass(state);
  for (let i = 0; i < steps.length; i += 4) {
    const kind = steps[i];
    const at = steps[i + 1];
    const amount = steps[i + 2];
    if (kind === CPU_CLAIM || kind === SPAN_CLAIM) {
      pending.push(kind, at, amount);
      if (kind === CPU_CLAIM) pendingCpu[at] = pass;
      else pendingSpan[at] = pass;
      continue;
    }
    let value: number;
    if (kind === CPU_CHECK) {
      value = cpu[at];
      if (pendingCpu[at] === pass) {
        for (let j = 0; j < pending.length; j += 3) if (pending[j] === CPU_CLAIM && pending[j + 1] === at) value -= pending[j + 2];
      }
    } else {
      value = kind === GBPS_CHECK ? gbps[at] : protectedGbps[at];
      if (pendingSpan[at] === pass) {
        for (let j = 0; j < pending.length; j += 3) if (pending[j] === SPAN_CLAIM && pending[j + 1] === at) value -= pending[j + 2];
      }
    }
    if (fits(amount, value) !== (steps[i + 3] === 1)) return false;
  }
  return true;
}

/** Replays a record that holds (see replayHolds). */
function replayBlock(problem: RemapProblem, state: ClaimState, block: RemapSlice, rec: BlockRecord): void {
  if (rec.attempted && replayAttempt(problem, state, block, rec)) return;
  settle(problem, state, block, null);
}

/** Whether the block's own genes (keep, sites, paths; not the order key) are the same in both genomes. */
function sameBlockGenes(problem: RemapProblem, block: RemapSlice, a: Float64Array, b: Float64Array): boolean {
  if (block.keepGene >= 0 && a[block.keepGene] !== b[block.keepGene]) return false;
  for (const k of block.functions) if (a[problem.functions[k].gene] !== b[problem.functions[k].gene]) return false;
  for (const k of block.ties) if (a[problem.ties[k].gene] !== b[problem.ties[k].gene]) return false;
  return true;
}

function runLogged(problem: RemapProblem, state: ClaimState, sites: Int32Array, genes: Float64Array, order: Int32Array, parent: DecodeLog | null, out: BlockRecord[]): void {
  resetClaimState(problem, state);
  for (let p = 0; p < order.length; p += 1) {
    const b = order[p];
    const block = problem.slices[b];
    releaseHeld(state, block);
    const prev = parent ? parent.records[b] : undefined;
    if (prev !== undefined && sameBlockGenes(problem, block, genes, parent!.genes) && replayHolds(problem, state, block, prev)) {
      replayBlock(problem, state, block, prev);
      out[b] = prev;
    } else {
      const rec = newBlockRecord();
      decodeReleased(problem, state, block, genes, sites, rec);
      out[b] = rec;
    }
  }
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
    evaluateLogged(genes, parent, into) {
      const log = into && into !== parent && into.genes.length === genes.length
        ? into : { genes: new Float64Array(genes.length), records: new Array<BlockRecord>(n) };
      sortByKeys(problem, genes, order);
      runLogged(problem, state, sites, genes, order, parent, log.records);
      log.genes.set(genes);
      return { fitness: toFitness(state), log };
    },
  };
}

export function decode(problem: RemapProblem, genes: Float64Array): Decoded {
  return createDecoder(problem).decode(genes);
}

/**
 * The problem as DE sees it: bounds plus an allocation-light evaluator. `incremental`: trials are evaluated
 * against their parent's decode log (Decoder.evaluateLogged) — the same fitness, far fewer path searches on
 * large windows, where a trial re-draws a few slices' genes and the rest replay.
 */
export function toDEProblem(problem: RemapProblem, decoder: Decoder = createDecoder(problem), options: { incremental?: boolean } = {}): DEProblem {
  const base = { dimension: problem.dimension, lower: problem.lower, upper: problem.upper };
  if (!options.incremental) return { ...base, evaluate: (x) => decoder.evaluate(x) };
  // Logs by genome buffer: DE reuses and swaps its buffers, so a buffer's log is replaced whenever it is
  // evaluated again; a log also carries the genes it decoded, so a stale one is never taken for current.
  const logs = new WeakMap<Float64Array, DecodeLog>();
  const logged = (x: Float64Array, parent: DecodeLog | null) => {
    const r = decoder.evaluateLogged(x, parent, logs.get(x));
    logs.set(x, r.log);
    return r.fitness;
  };
  return { ...base, evaluate: (x) => logged(x, null), evaluateTrial: (trial, parent) => logged(trial, logs.get(parent) ?? null) };
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
