// Says, for each slice a plan leaves unresolved, which constraint stands in the way — for the review screen.
import { fits } from '../model/tolerance';
import type { SlicePlacement } from '../model/types';
import { shortestLatencyPath } from '../paths/shortest-path';
import { createClaimState, type ClaimState } from './claims';
import { claimPlacement } from './place-slice';
import { functionWords, tieWords } from './reason-words';
import type { RemapProblem, RemapSlice } from './remap-types';

/** Nearest candidate per function with enough CPU left after the plan, or the reason there is none. */
function nearestSites(problem: RemapProblem, state: ClaimState, block: RemapSlice): Int32Array | string {
  const sites = new Int32Array(block.functions.length);
  for (let fn = 0; fn < block.functions.length; fn += 1) {
    const f = problem.functions[block.functions[fn]];
    const cpu = problem.inv.slices[f.slice].functions[f.fn].cpu;
    const site = f.candidates.find((c) => fits(cpu, state.cpu[c]));
    if (site === undefined) {
      const what = functionWords(problem.inv.slices[f.slice].functions[f.fn]);
      return `no candidate site has ${cpu} vCPU left for ${what} once the other slices are placed`;
    }
    sites[fn] = site;
  }
  return sites;
}

function tieReason(problem: RemapProblem, state: ClaimState, block: RemapSlice, sites: Int32Array): string {
  const slice = problem.inv.slices[block.slice];
  for (const t of slice.ties) {
    const opts = { spanDown: problem.spanDown, siteDown: problem.siteDown };
    const from = sites[t.from];
    const to = sites[t.to];
    const link = tieWords(t, slice.functions);
    if (!shortestLatencyPath(problem.inv.network, from, to, opts)) return `no path survives the work for ${link}`;
    if (!shortestLatencyPath(problem.inv.network, from, to, { ...opts, maxLatencyMs: t.maxLatencyMs })) {
      return `no path that survives the work keeps ${link} within its ${t.maxLatencyMs} ms latency budget`;
    }
    const withBandwidth = { ...opts, maxLatencyMs: t.maxLatencyMs, residualGbps: state.gbps, minGbps: t.bandwidthGbps };
    if (!shortestLatencyPath(problem.inv.network, from, to, withBandwidth)) {
      return `not enough free bandwidth (${t.bandwidthGbps} Gbit/s) for ${link} within ${t.maxLatencyMs} ms`;
    }
  }
  return 'no placement meets every constraint together (availability, capacity or latency) alongside higher-priority slices';
}

/** Reasons keyed by slice index, for the slices `next` leaves unresolved. */
export function explainUnresolved(problem: RemapProblem, next: Map<number, SlicePlacement | null>): Map<number, string> {
  const state = createClaimState(problem);
  for (const block of problem.slices) {
    const placement = next.get(block.slice);
    if (placement) claimPlacement(problem, state, block.slice, placement);
  }
  const reasons = new Map<number, string>();
  for (const block of problem.slices) {
    if (next.get(block.slice) !== null) continue;
    if (block.blockedReason !== undefined) {
      reasons.set(block.slice, block.blockedReason);
      continue;
    }
    const sites = nearestSites(problem, state, block);
    reasons.set(block.slice, typeof sites === 'string' ? sites : tieReason(problem, state, block, sites));
  }
  return reasons;
}
