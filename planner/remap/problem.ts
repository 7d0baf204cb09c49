// The re-mapping problem for one window: the slices to re-place (touched ones, and knock-on candidates when
// allowed), candidate sites and paths, residual capacity, and the genome layout.
// Genome per block: a keep-out gene in [0, 1) for touched slices (< 0.5 = leave the slice unresolved), a random
// key in [0, 1) for the decode order, one gene per function in [0, candidates) and one per tie in [0, kPaths),
// both decoded by flooring (a tie's gene past the paths its end sites actually have picks the last one).
// Reference: J. C. Bean, "Genetics and random keys for sequencing and optimization", ORSA J. Computing 6 (1994)
// 154–160 (random keys for the order).
import { InvalidOptionError } from '../errors';
import { assessImpact } from '../impact/assess-impact';
import { placementLoad, windowCapacity } from '../model/window-capacity';
import type { Inventory, WindowSpec } from '../model/types';
import { candidateSites, type CandidateContext } from './candidates';
import { knockOnCandidates } from './knock-on';
import { createPathCatalog } from './path-catalog';
import type { RemapFunction, RemapProblem, RemapProblemOptions, RemapSlice, RemapTie } from './remap-types';

export type { RemapProblem, RemapProblemOptions, RemapSlice, RemapFunction, RemapTie } from './remap-types';

/** WARNING: bounds the gene range; wide ranges make DE wander to far sites that break latency budgets. */
export const DEFAULT_MAX_CANDIDATES = 16;
/**
 * Candidate paths per tie and pair of end sites. Measured against the exact solver's chosen routes on the
 * benchmark's scarce instances (bench/planner): its optimal plans used paths beyond the 4th shortest, rarely
 * beyond the 6th.
 */
export const DEFAULT_K_PATHS = 8;
/** Knock-on candidates read per allowed knock-on move (and at least this many in all). */
const KNOCK_ON_CANDIDATES_PER_MOVE = 4;
const MIN_KNOCK_ON_CANDIDATES = 8;

function siteFlags(inv: Inventory, ids: string[] | undefined): Uint8Array {
  const flags = new Uint8Array(inv.network.sites.length);
  for (const id of ids ?? []) {
    const i = inv.network.siteIndex.get(id);
    if (i !== undefined) flags[i] = 1;
  }
  return flags;
}

/** Capacity left for the blocks: window capacity minus reservations minus every other slice's load. */
function residuals(inv: Inventory, window: WindowSpec, options: RemapProblemOptions, blocks: Set<number>) {
  const cap = windowCapacity(inv, window, options.reservations);
  const others: number[] = [];
  for (let s = 0; s < inv.slices.length; s += 1) if (!blocks.has(s)) others.push(s);
  const load = placementLoad(inv, others);
  const residualCpu = cap.siteCpu;
  const residualGbps = cap.spanGbps;
  for (let i = 0; i < residualCpu.length; i += 1) residualCpu[i] -= load.siteCpu[i];
  for (let i = 0; i < residualGbps.length; i += 1) residualGbps[i] -= load.spanGbps[i];
  const capacityGbps = windowCapacity(inv, window).spanGbps;
  let basePeak = 0;
  for (let i = 0; i < capacityGbps.length; i += 1) {
    if (capacityGbps[i] > 0) basePeak = Math.max(basePeak, (capacityGbps[i] - residualGbps[i]) / capacityGbps[i]);
  }
  return { residualCpu, residualGbps, capacityGbps, siteDown: cap.siteDown, spanDown: cap.spanDown, basePeak };
}

/** Touched slices, most important first (priority 1 before 5), index breaking ties. */
function byPriority(inv: Inventory, affected: number[]): number[] {
  return [...affected].sort((a, b) => inv.slices[a].priority - inv.slices[b].priority || a - b);
}

/** The surviving current paths of a slice's ties, as (span, Gbps) pairs. */
function heldLoad(inv: Inventory, slice: number, spanDown: Uint8Array): { heldSpans: Int32Array; heldGbps: Float64Array } {
  const spans: number[] = [];
  const gbps: number[] = [];
  inv.slices[slice].ties.forEach((t, i) => {
    const path = inv.placements[slice].paths[i];
    if (path.some((span) => spanDown[span])) return;
    for (const span of path) {
      spans.push(span);
      gbps.push(t.bandwidthGbps);
    }
  });
  return { heldSpans: Int32Array.from(spans), heldGbps: Float64Array.from(gbps) };
}

function protectedResidual(residualGbps: Float64Array, slices: RemapSlice[]): Float64Array {
  const out = Float64Array.from(residualGbps);
  for (const b of slices) b.heldSpans.forEach((span, i) => { out[span] -= b.heldGbps[i]; });
  return out;
}

function checkOptions(o: RemapProblemOptions): { maxCandidates: number; kPaths: number } {
  const maxCandidates = o.maxCandidates ?? DEFAULT_MAX_CANDIDATES;
  const kPaths = o.kPaths ?? DEFAULT_K_PATHS;
  if (!Number.isInteger(maxCandidates) || maxCandidates < 1) throw new InvalidOptionError('maxCandidates must be an integer ≥ 1');
  if (!Number.isInteger(kPaths) || kPaths < 1) throw new InvalidOptionError('kPaths must be an integer ≥ 1');
  const k = o.knockOn;
  if (k && (!Number.isInteger(k.maxMoves) || k.maxMoves < 0)) throw new InvalidOptionError('knockOn.maxMoves must be an integer ≥ 0');
  return { maxCandidates, kPaths };
}

/** Knock-on candidates for the window, read on the residual network where every untouched slice stays put. */
function pickKnockOn(inv: Inventory, window: WindowSpec, o: RemapProblemOptions, affected: number[]): number[] {
  if (!o.knockOn || o.knockOn.maxMoves === 0) return [];
  const limit = o.knockOn.maxCandidates ?? Math.max(MIN_KNOCK_ON_CANDIDATES, KNOCK_ON_CANDIDATES_PER_MOVE * o.knockOn.maxMoves);
  const r = residuals(inv, window, o, new Set(affected));
  // A knock-on candidate must be able to stay where it is: none on a site the planner excluded.
  const excluded = siteFlags(inv, o.excludedSites);
  return knockOnCandidates({ inv, ...r, affected }, limit).filter((s) => inv.placements[s].sites.every((site) => !excluded[site]));
}

export function buildRemapProblem(inv: Inventory, window: WindowSpec, options: RemapProblemOptions = {}): RemapProblem {
  const { maxCandidates, kPaths } = checkOptions(options);
  const affected = [...assessImpact(inv, window, { reservations: options.reservations }).needsReplacement].sort((a, b) => a - b);
  const knockOn = pickKnockOn(inv, window, options, affected);
  const r = residuals(inv, window, options, new Set([...affected, ...knockOn]));
  const ctx: CandidateContext = {
    inv, residualCpu: r.residualCpu, siteDown: r.siteDown, excluded: siteFlags(inv, options.excludedSites),
    pinned: new Set(options.pinned ?? []), maxCandidates, byDistance: new Map(),
  };
  const slices: RemapSlice[] = [];
  const functions: RemapFunction[] = [];
  const ties: RemapTie[] = [];
  const lower: number[] = [];
  const upper: number[] = [];
  const gene = (hi: number) => { lower.push(0); upper.push(hi); return lower.length - 1; };
  const order = [...knockOn.map((s) => ({ s, touched: false })), ...byPriority(inv, affected).map((s) => ({ s, touched: true }))];
  for (const { s: slice, touched } of order) {
    const keepGene = touched ? gene(1) : -1;
    const block: RemapSlice = {
      slice, touched, keepGene, orderGene: gene(1), functions: [], ties: [], ...heldLoad(inv, slice, r.spanDown),
    };
    inv.slices[slice].functions.forEach((_f, fn) => {
      const list = candidateSites(ctx, slice, fn);
      if (list.reason !== undefined && block.blockedReason === undefined) block.blockedReason = list.reason;
      block.functions.push(functions.length);
      functions.push({ slice, fn, candidates: list.candidates, gene: gene(Math.max(1, list.candidates.length)) });
    });
    inv.slices[slice].ties.forEach((_t, tie) => {
      block.ties.push(ties.length);
      ties.push({ slice, tie, gene: gene(kPaths) });
    });
    slices.push(block);
  }
  return {
    inv, window, options, affected, slices, functions, ties, kPaths,
    maxKnockOnMoves: options.knockOn?.maxMoves ?? 0,
    paths: createPathCatalog({ inv, siteDown: r.siteDown, spanDown: r.spanDown, residualGbps: r.residualGbps, kPaths }),
    dimension: lower.length, lower: Float64Array.from(lower), upper: Float64Array.from(upper),
    residualCpu: r.residualCpu, residualGbps: r.residualGbps, capacityGbps: r.capacityGbps,
    protectedGbps: protectedResidual(r.residualGbps, slices),
    siteDown: r.siteDown, spanDown: r.spanDown, basePeakUtilisation: r.basePeak,
  };
}
