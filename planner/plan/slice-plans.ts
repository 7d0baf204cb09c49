// Converts plans between the planner's index form (Map slice → placement) and the id form stored and shown (SlicePlan).
import { InvalidOptionError, UnknownElementError } from '../errors';
import type { Inventory, Outcome, SlicePlacement, SlicePlan } from '../model/types';

function samePath(a: readonly number[], b: readonly number[]): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}

/** 'move' if any function site changed, else 'reroute' if any tie path changed, else 'stays'; null → 'unresolved'. */
export function classifyOutcome(inv: Inventory, sliceIndex: number, next: SlicePlacement | null): Outcome {
  if (next === null) return 'unresolved';
  const current = inv.placements[sliceIndex];
  if (next.sites.some((site, i) => site !== current.sites[i])) return 'move';
  if (next.paths.some((path, i) => !samePath(path, current.paths[i]))) return 'reroute';
  return 'stays';
}

/** Ties whose path differs from the current placement. */
export function changedTies(inv: Inventory, sliceIndex: number, next: SlicePlacement): number {
  const current = inv.placements[sliceIndex];
  let changed = 0;
  next.paths.forEach((path, i) => { if (!samePath(path, current.paths[i])) changed++; });
  return changed;
}

/** Id form, in ascending slice order; `reasons` annotates unresolved slices. */
export function toSlicePlans(
  inv: Inventory, next: Map<number, SlicePlacement | null>, reasons?: Map<number, string>,
): SlicePlan[] {
  const { sites, spans } = inv.network;
  return [...next.keys()].sort((a, b) => a - b).map((s) => {
    const slice = inv.slices[s];
    const placement = next.get(s) ?? null;
    const plan: SlicePlan = { slice: slice.id, outcome: classifyOutcome(inv, s, placement), sites: {}, paths: {} };
    if (placement === null) {
      plan.reason = reasons?.get(s) ?? 'no feasible placement found';
      return plan;
    }
    slice.functions.forEach((f, i) => { plan.sites[f.id] = sites[placement.sites[i]].id; });
    slice.ties.forEach((t, i) => { plan.paths[t.id] = placement.paths[i].map((x) => spans[x].id); });
    return plan;
  });
}

function lookup(index: Map<string, number>, id: string, what: string): number {
  const i = index.get(id);
  if (i === undefined) throw new UnknownElementError(`plan names unknown ${what} "${id}"`);
  return i;
}

/** Index form; throws UnknownElementError / InvalidOptionError on anything it cannot map (use verifyPlan to report instead). */
export function fromSlicePlans(inv: Inventory, slices: readonly SlicePlan[]): Map<number, SlicePlacement | null> {
  const next = new Map<number, SlicePlacement | null>();
  for (const plan of slices) {
    const s = lookup(inv.sliceIndex, plan.slice, 'slice');
    if (plan.outcome === 'unresolved') {
      next.set(s, null);
      continue;
    }
    const slice = inv.slices[s];
    const sites = slice.functions.map((f) => {
      const siteId = plan.sites[f.id];
      if (siteId === undefined) throw new InvalidOptionError(`plan of "${slice.id}" misses function "${f.id}"`);
      return lookup(inv.network.siteIndex, siteId, 'site');
    });
    const paths = slice.ties.map((t) => {
      const path = plan.paths[t.id];
      if (path === undefined) throw new InvalidOptionError(`plan of "${slice.id}" misses tie "${t.id}"`);
      return path.map((id) => lookup(inv.network.spanIndex, id, 'span'));
    });
    next.set(s, { sites, paths });
  }
  return next;
}
