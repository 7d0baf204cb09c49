// A window's impact on slices (hosted, transit, squeezed, unprotected), network splits and overloaded spans.
// Work grows with the answer (reverse index), except the O(network) bridge and component passes.
import type { Inventory, NetworkModel, Reservation, WindowSpec } from '../model/types';
import { windowCapacity } from '../model/window-capacity';
import { resolveWindow } from '../model/window-elements';
import { countComponents, findBridges } from './bridges';
import { elementIndexFor, type ElementIndex } from './element-index';
import { findOverloaded, type CutTie, type OverloadedSpan } from './overload';
import { sliceSeverity, type Severity } from './severity';
import { findSqueezed } from './squeeze';

export type ImpactReason = 'hosted' | 'transit' | 'squeezed' | 'unprotected';

export interface AffectedSlice {
  slice: string;
  sliceIndex: number;
  reasons: ImpactReason[];
  severity: Severity;
}

export interface ImpactReport {
  affected: AffectedSlice[];
  /** hosted ∪ transit ∪ squeezed, ascending slice indices */
  needsReplacement: number[];
  splits: boolean;
  components: number;
  overloaded: OverloadedSpan[];
}

export interface AssessOptions {
  index?: ElementIndex;
  reservations?: Reservation;
}

/** Packs (slice, tie) into one number; no slice has anywhere near 2^20 ties. */
const TIE_KEY_STRIDE = 2 ** 20;

const REASON_ORDER: ImpactReason[] = ['hosted', 'transit', 'squeezed', 'unprotected'];

const fullNetworkFacts = new WeakMap<NetworkModel, { bridges: Uint8Array; components: number }>();

function fullFacts(net: NetworkModel) {
  let facts = fullNetworkFacts.get(net);
  if (facts === undefined) {
    facts = { bridges: findBridges(net), components: countComponents(net) };
    fullNetworkFacts.set(net, facts);
  }
  return facts;
}

class ReasonTally {
  readonly bySlice = new Map<number, Set<ImpactReason>>();
  add(slice: number, reason: ImpactReason): void {
    let set = this.bySlice.get(slice);
    if (set === undefined) this.bySlice.set(slice, (set = new Set()));
    set.add(reason);
  }
}

/** Ties crossing a flagged span, deduplicated, in (slice, tie) order. */
function tiesOn(index: ElementIndex, flagged: Iterable<number>): CutTie[] {
  const seen = new Set<number>();
  const out: CutTie[] = [];
  for (const span of flagged) {
    for (let k = index.spanStart[span]; k < index.spanStart[span + 1]; k++) {
      const [s, t] = [index.spanSlice[k], index.spanTie[k]];
      const key = s * TIE_KEY_STRIDE + t;
      if (seen.has(key)) continue;
      seen.add(key);
      out.push([s, t]);
    }
  }
  return out.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
}

function flaggedIndices(flags: Uint8Array): number[] {
  const out: number[] = [];
  for (let i = 0; i < flags.length; i++) if (flags[i]) out.push(i);
  return out;
}

export function assessImpact(inv: Inventory, window: WindowSpec, opts: AssessOptions = {}): ImpactReport {
  const net = inv.network;
  const index = opts.index ?? elementIndexFor(inv);
  const w = resolveWindow(net, window);
  const cap = windowCapacity(inv, window);
  const tally = new ReasonTally();
  const downSpans = flaggedIndices(cap.spanDown);
  for (const site of flaggedIndices(cap.siteDown)) {
    for (let k = index.siteStart[site]; k < index.siteStart[site + 1]; k++) tally.add(index.siteSlice[k], 'hosted');
  }
  const cut = tiesOn(index, downSpans);
  for (const [s] of cut) tally.add(s, 'transit');
  const squeezed = findSqueezed(inv, index, w, cap.siteDown, cap.spanDown, opts.reservations);
  for (const site of squeezed.sites) {
    for (let k = index.siteStart[site]; k < index.siteStart[site + 1]; k++) tally.add(index.siteSlice[k], 'squeezed');
  }
  for (const [s] of tiesOn(index, squeezed.spans)) tally.add(s, 'squeezed');
  const full = fullFacts(net);
  const degraded = findBridges(net, cap);
  const newBridges = flaggedIndices(degraded).filter((span) => !full.bridges[span]);
  const cutKeys = new Set(cut.map(([s, t]) => s * TIE_KEY_STRIDE + t));
  for (const [s, t] of tiesOn(index, newBridges)) {
    if (!cutKeys.has(s * TIE_KEY_STRIDE + t)) tally.add(s, 'unprotected');
  }
  const components = countComponents(net, cap);
  return {
    affected: [...tally.bySlice.keys()].sort((a, b) => a - b).map((s) => {
      const reasons = REASON_ORDER.filter((r) => tally.bySlice.get(s)!.has(r));
      const serviceHit = reasons.some((r) => r !== 'unprotected');
      return { slice: inv.slices[s].id, sliceIndex: s, reasons, severity: sliceSeverity(inv.slices[s], serviceHit) };
    }),
    needsReplacement: [...tally.bySlice].filter(([, r]) => r.has('hosted') || r.has('transit') || r.has('squeezed'))
      .map(([s]) => s).sort((a, b) => a - b),
    splits: components > full.components,
    components,
    overloaded: findOverloaded(inv, index, cap, cut, w.reducedSpans.keys(), opts.reservations),
  };
}
