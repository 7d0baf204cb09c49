// The decoder's kernel: places one slice on the sites and paths its genes pick, repairing a pick that does not
// fit with the first candidate that does, and takes the whole slice back when any part cannot be placed.
import { fits } from '../model/tolerance';
import type { SlicePlacement } from '../model/types';
import { REROUTE_COST } from '../plan/evaluate-plan';
import { shortestLatencyPath } from '../paths/shortest-path';
import {
  claimCpu, claimFinal, claimPath, commit, cpuFits, mark, spanFits, STEP_GBPS_CHECK, STEP_PROTECTED_CHECK, undoSince, type BlockRecord, type ClaimState,
} from './claims';
import type { PathList } from './path-catalog';
import type { RemapProblem, RemapSlice } from './remap-types';

export function geneIndex(gene: number, count: number, range: number): number {
  const i = Math.floor((gene * count) / range);
  return i < 0 ? 0 : i >= count ? count - 1 : i;
}

function pathFits(state: ClaimState, path: readonly number[], gbps: number, residual: Float64Array): boolean {
  for (const span of path) if (!spanFits(state, residual, span, gbps)) return false;
  return true;
}

function availability(problem: RemapProblem, path: readonly number[]): number {
  let a = 1;
  for (const span of path) a *= problem.inv.network.spans[span].availability;
  return a;
}

/** Catalogue paths the repair tries, in order, when the gene's own path does not fit. */
const REPAIR_PATHS = 3;

/** The gene's path when it fits; else one of the catalogue's first paths that fits around later slices' paths, then anywhere. */
function pickFromCatalogue(list: PathList, gene: number, gbps: number, state: ClaimState): readonly number[] | null {
  const chosen = list.at(Math.max(0, Math.floor(gene)));
  if (chosen === null) return null;
  if (pathFits(state, chosen.spans, gbps, state.gbps)) return chosen.spans;
  for (const residual of [state.protectedGbps, state.gbps]) {
    for (let i = 0; i < REPAIR_PATHS; i += 1) {
      const p = list.at(i)!;
      if (p !== chosen && pathFits(state, p.spans, gbps, residual)) return p.spans;
    }
  }
  return null;
}

/**
 * The current path when the gene picks the catalogue's first entry, the end sites are unchanged and the path
 * still qualifies and fits: the catalogue starts with it, so this skips building the list (most slices keep
 * their paths).
 */
function keptPath(problem: RemapProblem, state: ClaimState, block: RemapSlice, tie: number, sites: Int32Array, gene: number): readonly number[] | null {
  const t = problem.inv.slices[block.slice].ties[tie];
  const current = problem.inv.placements[block.slice];
  if (gene >= 1 || sites[t.from] !== current.sites[t.from] || sites[t.to] !== current.sites[t.to]) return null;
  const path = current.paths[tie];
  let latencyMs = 0;
  for (const span of path) {
    if (problem.spanDown[span] || !spanFits(state, state.gbps, span, t.bandwidthGbps)) return null;
    latencyMs += problem.inv.network.spans[span].latencyMs;
  }
  if (latencyMs > t.maxLatencyMs) return null;
  if (t.minAvailability !== undefined && availability(problem, path) < t.minAvailability) return null;
  return path;
}

/** Scratch for the free path search's bandwidth tests. */
const examined: number[] = [];

/** Routes tie `tie` of the block between the chosen sites; null when nothing fits. Claims nothing. */
function routeTie(problem: RemapProblem, state: ClaimState, block: RemapSlice, tie: number, sites: Int32Array, gene: number): readonly number[] | null {
  const kept = keptPath(problem, state, block, tie, sites, gene);
  if (kept !== null) return kept;
  const t = problem.inv.slices[block.slice].ties[tie];
  const from = sites[t.from];
  const to = sites[t.to];
  const listed = pickFromCatalogue(problem.paths.get(block.slice, tie, from, to), gene, t.bandwidthGbps, state);
  if (listed !== null) return listed;
  // Beyond the catalogue: the shortest route on what is left, around later slices' current paths first.
  // The search's bandwidth tests are recorded like the other checks: with the same answers it finds the same route.
  for (const o of [state.protectedOptions, state.pathOptions]) {
    o.minGbps = t.bandwidthGbps;
    o.maxLatencyMs = t.maxLatencyMs;
    o.examined = state.rec ? examined : undefined;
    examined.length = 0;
    const found = shortestLatencyPath(problem.inv.network, from, to, o);
    o.examined = undefined;
    if (state.rec) {
      const kind = o === state.pathOptions ? STEP_GBPS_CHECK : STEP_PROTECTED_CHECK;
      for (let i = 0; i < examined.length; i += 2) state.rec.steps.push(kind, examined[i], t.bandwidthGbps, examined[i + 1]);
    }
    if (found && (t.minAvailability === undefined || availability(problem, found.spans) >= t.minAvailability)) return found.spans;
  }
  return null;
}

function samePath(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return false;
  return true;
}

/** What tally found: the slice stays as it was, only reroutes, or moves a function. */
const SAME = 0;
const REROUTED = 1;
const MOVED = 2;

/** Adds the move to the totals: its move cost terms in order, then the moved or rerouted count. */
function countMove(state: ClaimState, terms: readonly number[], kind: number): void {
  for (let i = 0; i < terms.length; i += 1) state.moveCost += terms[i];
  if (kind === MOVED) state.moved += 1;
  else if (kind === REROUTED) state.rerouted += 1;
}

/** Move cost terms (in the order they are added) and kind of a placed slice's move against its current placement. */
function tally(problem: RemapProblem, slice: number, sites: ArrayLike<number>, paths: readonly (readonly number[])[], terms: number[]): number {
  const info = problem.inv.slices[slice];
  const current = problem.inv.placements[slice];
  let moved = false;
  let changed = false;
  info.functions.forEach((f, fn) => {
    if (sites[fn] !== current.sites[fn]) { moved = true; terms.push(f.moveCost); }
  });
  paths.forEach((path, tie) => {
    if (!samePath(path, current.paths[tie])) { changed = true; terms.push(REROUTE_COST); }
  });
  return moved ? MOVED : changed ? REROUTED : SAME;
}

/**
 * Claims the block on the sites and paths its genes pick (repaired where a pick does not fit). Returns the
 * placement, or null after taking back every claim when some function or tie cannot be placed.
 */
export function placeSlice(problem: RemapProblem, state: ClaimState, block: RemapSlice, genes: Float64Array, sites: Int32Array): SlicePlacement | null {
  const slice = problem.inv.slices[block.slice];
  const m = mark(state);
  const rec = state.rec;
  if (rec) rec.attempted = true;
  for (let fn = 0; fn < block.functions.length; fn += 1) {
    const f = problem.functions[block.functions[fn]];
    const cpu = slice.functions[fn].cpu;
    let i = geneIndex(genes[f.gene], f.candidates.length, f.candidates.length);
    if (!cpuFits(state, f.candidates[i], cpu)) i = f.candidates.findIndex((site) => cpuFits(state, site, cpu));
    if (i < 0) { undoSince(state, m); return null; }
    sites[fn] = f.candidates[i];
    rec?.sites.push(sites[fn]);
    claimCpu(state, sites[fn], cpu);
  }
  const paths: number[][] = [];
  for (let tie = 0; tie < block.ties.length; tie += 1) {
    const path = routeTie(problem, state, block, tie, sites, genes[problem.ties[block.ties[tie]].gene]);
    if (path === null) { undoSince(state, m); return null; }
    rec?.paths.push(path);
    claimPath(problem, state, path, slice.ties[tie].bandwidthGbps);
    paths.push(path as number[]);
  }
  if (rec) rec.placed = true;
  return finishPlacement(problem, state, block, Array.from(sites.subarray(0, block.functions.length)), paths);
}

/** The block's claims are complete: commits them and counts the move (kept in the record, for replays). */
function finishPlacement(problem: RemapProblem, state: ClaimState, block: RemapSlice, sites: number[], paths: number[][]): SlicePlacement {
  commit(state);
  const terms = state.rec ? state.rec.moveTerms : [];
  const kind = tally(problem, block.slice, sites, paths, terms);
  if (state.rec) state.rec.move = kind;
  countMove(state, terms, kind);
  if (kind !== SAME && !block.touched) state.knockOnMoves += 1;
  return { sites, paths };
}

/**
 * Claims what a recorded attempt claimed, in the same order and with the same arithmetic, without deciding
 * anything: the caller has checked that the attempt would decide the same now (see BlockRecord). Returns whether
 * the slice was placed (else its claims were taken back); the placement itself is the record's.
 */
export function replayAttempt(problem: RemapProblem, state: ClaimState, block: RemapSlice, rec: BlockRecord): boolean {
  if (!rec.placed) {
    const slice = problem.inv.slices[block.slice];
    const m = mark(state);
    for (let fn = 0; fn < rec.sites.length; fn += 1) claimCpu(state, rec.sites[fn], slice.functions[fn].cpu);
    for (let tie = 0; tie < rec.paths.length; tie += 1) claimPath(problem, state, rec.paths[tie], slice.ties[tie].bandwidthGbps);
    undoSince(state, m);
    return false;
  }
  claimFinal(problem, state, block, rec.sites, rec.paths);
  commit(state);
  countMove(state, rec.moveTerms, rec.move);
  if (rec.move !== SAME && !block.touched) state.knockOnMoves += 1;
  return true;
}

/**
 * Claims a given placement as it is, e.g. an untouched slice kept where it is. What does not fit is claimed anyway
 * and counted as violation (the share of the demand that does not fit), so Deb's rules steer away from it.
 */
export function claimPlacement(problem: RemapProblem, state: ClaimState, slice: number, placement: SlicePlacement): void {
  const info = problem.inv.slices[slice];
  info.functions.forEach((f, fn) => {
    const site = placement.sites[fn];
    const free = Math.max(0, state.cpu[site]);
    if (!fits(f.cpu, free)) state.violation += (f.cpu - free) / f.cpu;
    claimCpu(state, site, f.cpu);
  });
  info.ties.forEach((t, tie) => {
    for (const span of placement.paths[tie]) {
      const free = Math.max(0, state.gbps[span]);
      if (!fits(t.bandwidthGbps, free)) state.violation += (t.bandwidthGbps - free) / t.bandwidthGbps;
    }
    claimPath(problem, state, placement.paths[tie], t.bandwidthGbps);
  });
  commit(state);
}
