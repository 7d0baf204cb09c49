// The re-mapping problem for one window: affected slices, candidate sites, residual capacity, genome layout.
// Genome per affected slice (slices in priority order): one keep-out gene in [0, 1) (< 0.5 = leave the
// slice unresolved), then one gene per function in [0, candidates) decoded by flooring.
import { InvalidOptionError } from '../errors';
import { assessImpact } from '../impact/assess-impact';
import { placementLoad, windowCapacity } from '../model/window-capacity';
import type { Inventory, WindowSpec } from '../model/types';
import { candidateSites, type CandidateContext } from './candidates';
import type { RemapFunction, RemapProblem, RemapProblemOptions, RemapSlice } from './remap-types';

export type { RemapProblem, RemapProblemOptions, RemapSlice, RemapFunction } from './remap-types';

/** WARNING: bounds the gene range; wide ranges make DE wander to far sites that break latency budgets. */
export const DEFAULT_MAX_CANDIDATES = 16;

function siteFlags(inv: Inventory, ids: string[] | undefined): Uint8Array {
  const flags = new Uint8Array(inv.network.sites.length);
  for (const id of ids ?? []) {
    const i = inv.network.siteIndex.get(id);
    if (i !== undefined) flags[i] = 1;
  }
  return flags;
}

/** Capacity left for the affected slices: window capacity minus reservations minus everyone else's load. */
function residuals(inv: Inventory, window: WindowSpec, options: RemapProblemOptions, affected: Set<number>) {
  const cap = windowCapacity(inv, window, options.reservations);
  const others: number[] = [];
  for (let s = 0; s < inv.slices.length; s += 1) if (!affected.has(s)) others.push(s);
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

/** Affected slices, most important first (priority 1 before 5), index breaking ties. */
function decodeOrder(inv: Inventory, affected: number[]): number[] {
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

export function buildRemapProblem(inv: Inventory, window: WindowSpec, options: RemapProblemOptions = {}): RemapProblem {
  const maxCandidates = options.maxCandidates ?? DEFAULT_MAX_CANDIDATES;
  if (!Number.isInteger(maxCandidates) || maxCandidates < 1) throw new InvalidOptionError('maxCandidates must be an integer ≥ 1');
  const affected = [...assessImpact(inv, window, { reservations: options.reservations }).needsReplacement].sort((a, b) => a - b);
  const r = residuals(inv, window, options, new Set(affected));
  const ctx: CandidateContext = {
    inv, residualCpu: r.residualCpu, siteDown: r.siteDown, excluded: siteFlags(inv, options.excludedSites),
    pinned: new Set(options.pinned ?? []), maxCandidates, byDistance: new Map(),
  };
  const slices: RemapSlice[] = [];
  const functions: RemapFunction[] = [];
  const lower: number[] = [];
  const upper: number[] = [];
  for (const slice of decodeOrder(inv, affected)) {
    const block: RemapSlice = { slice, keepGene: lower.length, functions: [], ...heldLoad(inv, slice, r.spanDown) };
    lower.push(0);
    upper.push(1);
    inv.slices[slice].functions.forEach((_f, fn) => {
      const list = candidateSites(ctx, slice, fn);
      if (list.reason !== undefined && block.blockedReason === undefined) block.blockedReason = list.reason;
      block.functions.push(functions.length);
      functions.push({ slice, fn, candidates: list.candidates, gene: lower.length });
      lower.push(0);
      upper.push(Math.max(1, list.candidates.length));
    });
    slices.push(block);
  }
  return {
    inv, window, options, affected, slices, functions,
    dimension: lower.length, lower: Float64Array.from(lower), upper: Float64Array.from(upper),
    residualCpu: r.residualCpu, residualGbps: r.residualGbps, capacityGbps: r.capacityGbps,
    protectedGbps: protectedResidual(r.residualGbps, slices),
    siteDown: r.siteDown, spanDown: r.spanDown, basePeakUtilisation: r.basePeak,
  };
}
