// Breaks a move plan into single make-before-break steps: one per moved function, one per rerouted tie.
import type { Inventory, SlicePlacement } from '../model/types';

export interface PendingStep {
  slice: number;
  kind: 'move-function' | 'reroute-tie';
  /** function or tie index within the slice */
  part: number;
  /** site index (move) */
  fromSite: number;
  toSite: number;
  /** span indices (reroute) */
  fromSpans: number[];
  toSpans: number[];
}

function samePath(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}

/** Steps in slice order, functions before ties; unresolved and unchanged slices give none. */
export function listSteps(inv: Inventory, next: Map<number, SlicePlacement | null>): PendingStep[] {
  const steps: PendingStep[] = [];
  for (const s of [...next.keys()].sort((a, b) => a - b)) {
    const planned = next.get(s);
    if (!planned) continue;
    const current = inv.placements[s];
    current.sites.forEach((site, f) => {
      if (planned.sites[f] === site) return;
      steps.push({ slice: s, kind: 'move-function', part: f, fromSite: site, toSite: planned.sites[f], fromSpans: [], toSpans: [] });
    });
    current.paths.forEach((path, t) => {
      if (samePath(path, planned.paths[t])) return;
      steps.push({ slice: s, kind: 'reroute-tie', part: t, fromSite: -1, toSite: -1, fromSpans: path, toSpans: planned.paths[t] });
    });
  }
  return steps;
}
