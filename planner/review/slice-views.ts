// Per affected slice of a plan: outcome, before → after of every moved function and rerouted tie, and why it
// stayed unresolved — the rows of the review screen (shared/plans.ts planSliceSchema).
import type { PlacementView, PlanSlice } from '../../shared/plans';
import type { ImpactReport } from '../impact/assess-impact';
import type { Inventory, SlicePlacement, SlicePlan } from '../model/types';

export interface SliceViewOptions {
  /** slice id → display name (the inventory keeps ids only); the id is shown when missing */
  names?: ReadonlyMap<string, string>;
}

/** A placement in id form: function id → site id, tie id → span ids. */
export function placementView(inv: Inventory, sliceIndex: number, placement: SlicePlacement): PlacementView {
  const slice = inv.slices[sliceIndex];
  const { sites, spans } = inv.network;
  return {
    sites: Object.fromEntries(slice.functions.map((f, i) => [f.id, sites[placement.sites[i]].id])),
    paths: Object.fromEntries(slice.ties.map((t, i) => [t.id, placement.paths[i].map((x) => spans[x].id)])),
  };
}

function samePath(a: readonly string[], b: readonly string[]): boolean {
  return a.length === b.length && a.every((x, i) => x === b[i]);
}

function changes(before: PlacementView, after: PlacementView | null): Pick<PlanSlice, 'moves' | 'reroutes'> {
  if (after === null) return { moves: [], reroutes: [] };
  const moves = Object.entries(before.sites)
    .filter(([fn, from]) => after.sites[fn] !== undefined && after.sites[fn] !== from)
    .map(([fn, from]) => ({ function: fn, from, to: after.sites[fn] }));
  const reroutes = Object.entries(before.paths)
    .filter(([tie, from]) => after.paths[tie] !== undefined && !samePath(from, after.paths[tie]))
    .map(([tie, from]) => ({ tie, from, to: after.paths[tie] }));
  return { moves, reroutes };
}

function sliceView(inv: Inventory, plan: SlicePlan, reasons: string[], o: SliceViewOptions): PlanSlice {
  const s = inv.sliceIndex.get(plan.slice)!;
  const slice = inv.slices[s];
  const before = placementView(inv, s, inv.placements[s]);
  const after = plan.outcome === 'unresolved' ? null : { sites: { ...plan.sites }, paths: { ...plan.paths } };
  return {
    slice: slice.id, name: o.names?.get(slice.id) ?? slice.id, tenantId: slice.tenant,
    critical: slice.critical, priority: slice.priority, sst: slice.sst, reasons,
    outcome: plan.outcome, ...changes(before, after), before, after,
    unresolvedReason: plan.outcome === 'unresolved' ? plan.reason ?? 'no feasible placement found' : null,
    madeRoomFor: (plan.madeRoomFor ?? []).map((id) => ({ slice: id, name: o.names?.get(id) ?? id })),
  };
}

/** One row per slice of the plan, in the plan's order; impact reasons come from the window's impact report. */
export function sliceViews(inv: Inventory, slices: readonly SlicePlan[], impact: ImpactReport, o: SliceViewOptions = {}): PlanSlice[] {
  const reasons = new Map(impact.affected.map((a) => [a.slice, [...a.reasons]]));
  return slices.map((plan) => sliceView(inv, plan, reasons.get(plan.slice) ?? [], o));
}
