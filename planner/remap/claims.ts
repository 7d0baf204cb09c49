// The decoder's running state: residual capacity that claims consume, objective totals, and an undo log so a
// slice that cannot be placed whole is taken back without trace.
import { fits } from '../model/tolerance';
import type { PathOptions } from '../paths/shortest-path';
import type { RemapProblem, RemapSlice } from './remap-types';

/** Entries of BlockRecord.steps, four numbers each: kind, site or span, amount, outcome (1 = fits). */
export const STEP_CPU_CHECK = 0;
export const STEP_GBPS_CHECK = 1;
export const STEP_PROTECTED_CHECK = 2;
export const STEP_CPU_CLAIM = 3;
export const STEP_SPAN_CLAIM = 4;

/**
 * What one block's decode read and decided, so a later decode can replay it without the path searches: the
 * capacity checks in the order made (with the block's own claims between them, which later checks saw), and
 * the sites and paths claimed (a free path search's bandwidth tests count as checks). A decode whose checks come
 * out the same makes the same decisions, whatever changed elsewhere.
 */
export interface BlockRecord {
  steps: number[];
  /** untouched blocks: whether another knock-on move was still allowed when the block's turn came */
  mayMove: boolean;
  /** placeSlice ran (touched and kept in, or untouched and allowed to move) */
  attempted: boolean;
  /** claimed in order: one site per function, then one path per tie, up to where the attempt stopped */
  sites: number[];
  paths: (readonly number[])[];
  /** the attempt placed the whole slice (else its claims were taken back) */
  placed: boolean;
  /** placed: the move cost terms in the order added, and the move's kind (0 same, 1 rerouted, 2 moved) */
  moveTerms: number[];
  move: number;
}

export function newBlockRecord(): BlockRecord {
  return { steps: [], mayMove: false, attempted: false, sites: [], paths: [], placed: false, moveTerms: [], move: 0 };
}

/** Running totals of one decode; the residual arrays are working copies that claims consume. */
export interface ClaimState {
  cpu: Float64Array;
  gbps: Float64Array;
  /** gbps minus the current paths of the blocks not yet claimed (see RemapProblem.protectedGbps) */
  protectedGbps: Float64Array;
  pathOptions: PathOptions;
  protectedOptions: PathOptions;
  violation: number;
  unresolvedWeight: number;
  unresolved: number;
  moved: number;
  rerouted: number;
  moveCost: number;
  usage: number;
  peakUtilisation: number;
  /** knock-on candidates placed away from their current placement so far */
  knockOnMoves: number;
  /**
   * claims of the slice being placed: site (≥ 0) or span (encoded −1 − span), and the amount; entries below
   * `undoTop` count (the arrays keep their length, so the hot path does not reallocate them)
   */
  undoWhere: number[];
  undoAmount: number[];
  undoTop: number;
  /** the block being decoded records its checks and claims here when set (see BlockRecord) */
  rec: BlockRecord | null;
}

export function createClaimState(problem: RemapProblem): ClaimState {
  const cpu = Float64Array.from(problem.residualCpu);
  const gbps = Float64Array.from(problem.residualGbps);
  const protectedGbps = Float64Array.from(problem.protectedGbps);
  return {
    cpu, gbps, protectedGbps,
    pathOptions: { spanDown: problem.spanDown, siteDown: problem.siteDown, residualGbps: gbps },
    protectedOptions: { spanDown: problem.spanDown, siteDown: problem.siteDown, residualGbps: protectedGbps },
    violation: 0, unresolvedWeight: 0, unresolved: 0, moved: 0, rerouted: 0, moveCost: 0, usage: 0,
    peakUtilisation: problem.basePeakUtilisation, knockOnMoves: 0, undoWhere: [], undoAmount: [], undoTop: 0, rec: null,
  };
}

/** Back to the problem's residuals and zero totals, without allocating. */
export function resetClaimState(problem: RemapProblem, state: ClaimState): void {
  state.cpu.set(problem.residualCpu);
  state.gbps.set(problem.residualGbps);
  state.protectedGbps.set(problem.protectedGbps);
  state.violation = 0;
  state.unresolvedWeight = 0;
  state.unresolved = 0;
  state.moved = 0;
  state.rerouted = 0;
  state.moveCost = 0;
  state.usage = 0;
  state.peakUtilisation = problem.basePeakUtilisation;
  state.knockOnMoves = 0;
  state.undoTop = 0;
}

const TOTALS = 9;

/** A copy of the state's arrays and totals in one buffer (reused when `into` has the right size). */
export function saveClaimState(state: ClaimState, into?: Float64Array): Float64Array {
  const a = state.cpu.length;
  const b = state.gbps.length;
  const out = into && into.length === a + 2 * b + TOTALS ? into : new Float64Array(a + 2 * b + TOTALS);
  out.set(state.cpu, 0);
  out.set(state.gbps, a);
  out.set(state.protectedGbps, a + b);
  const t = a + 2 * b;
  out[t] = state.violation; out[t + 1] = state.unresolvedWeight; out[t + 2] = state.unresolved; out[t + 3] = state.moved;
  out[t + 4] = state.rerouted; out[t + 5] = state.moveCost; out[t + 6] = state.usage; out[t + 7] = state.peakUtilisation;
  out[t + 8] = state.knockOnMoves;
  return out;
}

export function loadClaimState(state: ClaimState, saved: Float64Array): void {
  const a = state.cpu.length;
  const b = state.gbps.length;
  state.cpu.set(saved.subarray(0, a));
  state.gbps.set(saved.subarray(a, a + b));
  state.protectedGbps.set(saved.subarray(a + b, a + 2 * b));
  const t = a + 2 * b;
  state.violation = saved[t]; state.unresolvedWeight = saved[t + 1]; state.unresolved = saved[t + 2]; state.moved = saved[t + 3];
  state.rerouted = saved[t + 4]; state.moveCost = saved[t + 5]; state.usage = saved[t + 6]; state.peakUtilisation = saved[t + 7];
  state.knockOnMoves = saved[t + 8];
  state.undoTop = 0;
}

/** fits(cpu, free vCPU at `site`), recorded when the state records. */
export function cpuFits(state: ClaimState, site: number, cpu: number): boolean {
  const ok = fits(cpu, state.cpu[site]);
  state.rec?.steps.push(STEP_CPU_CHECK, site, cpu, ok ? 1 : 0);
  return ok;
}

/** fits(gbps, what `residual` — the state's gbps or protectedGbps — has left on `span`), recorded when the state records. */
export function spanFits(state: ClaimState, residual: Float64Array, span: number, gbps: number): boolean {
  const ok = fits(gbps, residual[span]);
  state.rec?.steps.push(residual === state.gbps ? STEP_GBPS_CHECK : STEP_PROTECTED_CHECK, span, gbps, ok ? 1 : 0);
  return ok;
}

function logUndo(state: ClaimState, where: number, amount: number): void {
  const i = state.undoTop;
  if (i < state.undoWhere.length) {
    state.undoWhere[i] = where;
    state.undoAmount[i] = amount;
  } else {
    state.undoWhere.push(where);
    state.undoAmount.push(amount);
  }
  state.undoTop = i + 1;
}

export function claimCpu(state: ClaimState, site: number, cpu: number): void {
  state.rec?.steps.push(STEP_CPU_CLAIM, site, cpu, 0);
  state.cpu[site] -= cpu;
  logUndo(state, site, cpu);
}

export function claimPath(problem: RemapProblem, state: ClaimState, path: readonly number[], gbps: number): void {
  const spans = problem.inv.network.spans;
  for (const span of path) {
    state.rec?.steps.push(STEP_SPAN_CLAIM, span, gbps, 0);
    state.gbps[span] -= gbps;
    state.protectedGbps[span] -= gbps;
    logUndo(state, -1 - span, gbps);
    state.usage += gbps * spans[span].latencyMs;
    const cap = problem.capacityGbps[span];
    if (cap > 0) state.peakUtilisation = Math.max(state.peakUtilisation, (cap - state.gbps[span]) / cap);
  }
}

/**
 * claimCpu and claimPath for claims that are final at once (a replayed slice that was placed whole): the same
 * arithmetic, without the undo log, which commit would empty straight away.
 */
export function claimFinal(problem: RemapProblem, state: ClaimState, block: RemapSlice, sites: readonly number[], paths: readonly (readonly number[])[]): void {
  const info = problem.inv.slices[block.slice];
  const { cpu, gbps, protectedGbps } = state;
  for (let fn = 0; fn < sites.length; fn += 1) cpu[sites[fn]] -= info.functions[fn].cpu;
  const spans = problem.inv.network.spans;
  const capacity = problem.capacityGbps;
  for (let tie = 0; tie < paths.length; tie += 1) {
    const amount = info.ties[tie].bandwidthGbps;
    const path = paths[tie];
    for (let i = 0; i < path.length; i += 1) {
      const span = path[i];
      gbps[span] -= amount;
      protectedGbps[span] -= amount;
      state.usage += amount * spans[span].latencyMs;
      const cap = capacity[span];
      if (cap > 0) state.peakUtilisation = Math.max(state.peakUtilisation, (cap - gbps[span]) / cap);
    }
  }
}

/** Marks the start of one slice's claims; `undoSince` takes them back. */
export interface Mark { log: number; usage: number; peak: number }

export function mark(state: ClaimState): Mark {
  return { log: state.undoTop, usage: state.usage, peak: state.peakUtilisation };
}

export function undoSince(state: ClaimState, m: Mark): void {
  for (let i = state.undoTop - 1; i >= m.log; i -= 1) {
    const where = state.undoWhere[i];
    const amount = state.undoAmount[i];
    if (where >= 0) state.cpu[where] += amount;
    else {
      state.gbps[-1 - where] += amount;
      state.protectedGbps[-1 - where] += amount;
    }
  }
  state.undoTop = m.log;
  state.usage = m.usage;
  state.peakUtilisation = m.peak;
}

/** The slice's claims are final: forget them from the undo log. */
export function commit(state: ClaimState): void {
  state.undoTop = 0;
}

/** The block's turn has come: its current paths no longer need protecting from the others' new routes. */
export function releaseHeld(state: ClaimState, block: RemapSlice): void {
  for (let i = 0; i < block.heldSpans.length; i += 1) state.protectedGbps[block.heldSpans[i]] += block.heldGbps[i];
}
