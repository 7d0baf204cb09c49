// Candidate sites per affected function: where it may sit during the window, current site first, then nearest.
import { greatCircleKm } from '../geo/great-circle';
import { satisfiesAnchor } from '../model/anchor';
import { fits } from '../model/tolerance';
import type { Inventory } from '../model/types';
import { functionWords, siteWords } from './reason-words';

export interface CandidateContext {
  inv: Inventory;
  residualCpu: Float64Array;
  siteDown: Uint8Array;
  excluded: Uint8Array;
  /** pinned function ids, bare ("gw") or qualified by slice ("slice-7/gw") */
  pinned: Set<string>;
  maxCandidates: number;
  /** sites sorted by distance from a given site, filled lazily (functions share current sites) */
  byDistance: Map<number, Int32Array>;
}

export interface CandidateList {
  candidates: Int32Array;
  /** why the list is empty */
  reason?: string;
}

function sitesByDistance(ctx: CandidateContext, from: number): Int32Array {
  const cached = ctx.byDistance.get(from);
  if (cached) return cached;
  const sites = ctx.inv.network.sites;
  const distKm = Float64Array.from(sites, (s) => greatCircleKm(sites[from], s));
  const order = Int32Array.from(sites, (_s, i) => i);
  // Index breaks distance ties so the order (and so the genome) is deterministic.
  order.sort((a, b) => distKm[a] - distKm[b] || a - b);
  ctx.byDistance.set(from, order);
  return order;
}

function usable(ctx: CandidateContext, slice: number, fn: number, site: number): boolean {
  const f = ctx.inv.slices[slice].functions[fn];
  return !ctx.siteDown[site] && !ctx.excluded[site] && fits(f.cpu, ctx.residualCpu[site])
    && satisfiesAnchor(ctx.inv.network, f.anchor, site);
}

/** Fixed and pinned functions get only their current site; others every usable site up to the cap. */
export function candidateSites(ctx: CandidateContext, slice: number, fn: number): CandidateList {
  const f = ctx.inv.slices[slice].functions[fn];
  const current = ctx.inv.placements[slice].sites[fn];
  const pinned = ctx.pinned.has(f.id) || ctx.pinned.has(`${ctx.inv.slices[slice].id}/${f.id}`);
  if (f.fixed || pinned) {
    if (usable(ctx, slice, fn, current)) return { candidates: Int32Array.of(current) };
    const why = ctx.siteDown[current] ? 'is down' : ctx.excluded[current] ? 'is excluded' : 'lacks the CPU';
    const where = siteWords(ctx.inv.network.sites[current]);
    return { candidates: new Int32Array(0), reason: `${functionWords(f)} is ${f.fixed ? 'fixed' : 'pinned'} to ${where}, which ${why}` };
  }
  const out: number[] = usable(ctx, slice, fn, current) ? [current] : [];
  for (const site of sitesByDistance(ctx, current)) {
    if (out.length >= ctx.maxCandidates) break;
    if (site !== current && usable(ctx, slice, fn, site)) out.push(site);
  }
  if (out.length === 0) {
    return { candidates: new Int32Array(0), reason: `no usable site has ${f.cpu} vCPU free for ${functionWords(f)} (anchor, capacity or outage)` };
  }
  return { candidates: Int32Array.from(out) };
}
