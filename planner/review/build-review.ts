// Assembles everything the review screen shows for one finished run (shared/plans.ts planReviewSchema) from the
// inventory, the window and the planner's result; the reference solvers' answers are passed in.
import type { PlanReview, ReferenceResult } from '../../shared/plans';
import { assessImpact } from '../impact/assess-impact';
import type { Inventory, PlanResult, Reservation, WindowSpec } from '../model/types';
import { fromSlicePlans } from '../plan/slice-plans';
import { sliceRisk } from '../risk/slice-risk';
import { madeRoomForIndex } from '../steps/knock-on-order';
import { orderSteps } from '../steps/make-before-break';
import { sliceViews } from './slice-views';

export interface ReviewInputs {
  /** the reservation the run respected (steps and impact reasons use the same one) */
  reservations?: Reservation;
  reservedFor?: string[];
  /** slice id → display name */
  names?: ReadonlyMap<string, string>;
  greedy: ReferenceResult;
  exact: ReferenceResult | null;
  /** the DE search alone */
  computeMs: number;
}

/** Counts per outcome; move cost is the plan's (Σ moved functions' cost + reroute cost per changed tie). */
export function reviewTotals(result: PlanResult): PlanReview['totals'] {
  const count = (outcome: string) => result.slices.filter((s) => s.outcome === outcome).length;
  return {
    stays: count('stays'), moved: count('move'), rerouted: count('reroute'), unresolved: count('unresolved'),
    moveCost: result.objective.moveCost,
    knockOn: result.slices.filter((s) => (s.madeRoomFor?.length ?? 0) > 0).length,
  };
}

export function buildReview(inv: Inventory, window: WindowSpec, result: PlanResult, inputs: ReviewInputs): PlanReview {
  const impact = assessImpact(inv, window, { reservations: inputs.reservations });
  const next = fromSlicePlans(inv, result.slices);
  const order = orderSteps(inv, window, next, inputs.reservations, { madeRoomFor: madeRoomForIndex(inv, result.slices) });
  // sliceRisk covers every slice in service; the review shows the plan's (affected ones and knock-on moves;
  // unresolved ones are out of service).
  const shown = new Set([...result.affected, ...result.slices.map((s) => s.slice)]);
  const risk = sliceRisk(inv, window, next).filter((r) => shown.has(r.slice));
  return {
    affected: [...result.affected],
    objective: { ...result.objective },
    totals: reviewTotals(result),
    slices: sliceViews(inv, result.slices, impact, { names: inputs.names }),
    steps: order.steps,
    needsSpare: order.needsSpare,
    risk,
    trace: result.trace.map((p) => ({ ...p, best: { ...p.best } })),
    greedy: inputs.greedy,
    exact: inputs.exact,
    reservedFor: [...(inputs.reservedFor ?? [])],
    computeMs: inputs.computeMs,
    search: result.search ? { ...result.search, objective: { ...result.search.objective } } : null,
  };
}
