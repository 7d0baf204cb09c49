// What a plan run for one window must leave alone: capacity promised to the accepted plans of OTHER active
// windows that overlap it in time (DESIGN §4.2). The amounts are the planner's rule (overlapReservations).
import { overlapReservations, type OverlappingPlan } from '../../../planner/plan/overlap-reservations';
import type { Inventory, Reservation, SlicePlan } from '../../../planner/model/types';
import type { PlanSlice } from '../../../shared/plans';
import { ACTIVE_WINDOW_STATUSES } from '../../../shared/windows';
import { currentInventory } from '../inventory/inventory-cache';
import { selectOverlappingAcceptedPlans } from '../../queries/plans/overlapping-plans';
import { selectWindowTimes } from '../../queries/plans/plan-window';
import { selectElementsByWindow } from '../../queries/windows/window-rows';
import type { Queryable } from '../../../db/client';
import { windowSpecOf } from '../windows/window-spec';
import { WindowNotFoundError } from '../windows/errors';

export interface WindowReservations {
  reservations: Reservation;
  /** ids of the windows whose accepted plans were reserved, ascending */
  reservedFor: string[];
}

/**
 * A stored review slice in the planner's id form (`after` is null when the plan left it unresolved). A knock-on
 * move keeps the ids of the slices it makes room for: verification accepts an entry for an untouched slice only then.
 * Rows stored before knock-on moves existed have no madeRoomFor at all.
 */
export function toSlicePlan(s: PlanSlice): SlicePlan {
  const plan: SlicePlan = { slice: s.slice, outcome: s.outcome, sites: { ...(s.after?.sites ?? {}) }, paths: { ...(s.after?.paths ?? {}) } };
  const madeRoomFor = (s.madeRoomFor ?? []).map((m) => m.slice);
  if (madeRoomFor.length > 0) plan.madeRoomFor = madeRoomFor;
  return plan;
}

function storedSlices(result: unknown): PlanSlice[] {
  const slices = (result as { slices?: unknown } | null)?.slices;
  return Array.isArray(slices) ? (slices as PlanSlice[]) : [];
}

/**
 * Reservations for a run of `windowId`. `inv` is the current inventory, or builds it from data the caller already
 * read; it is only needed when an overlapping window has an accepted plan, and read from the database when not given.
 */
export async function reservationsFor(
  db: Queryable, windowId: string, inv?: Inventory | (() => Inventory),
): Promise<WindowReservations> {
  const self = await selectWindowTimes(db, windowId);
  if (!self) throw new WindowNotFoundError(windowId);
  const rows = await selectOverlappingAcceptedPlans(db, windowId, self, ACTIVE_WINDOW_STATUSES);
  if (rows.length === 0) return { reservations: {}, reservedFor: [] };
  const inventory = typeof inv === 'function' ? inv() : inv ?? (await currentInventory(db)).inventory;
  const elements = await selectElementsByWindow(db, rows.map((r) => r.id));
  const others: OverlappingPlan[] = rows.map((r) => ({
    window: windowSpecOf({ ...r, elements: elements.get(r.id) ?? [] }),
    slices: storedSlices(r.result).map(toSlicePlan),
  }));
  return { reservations: overlapReservations(inventory, others), reservedFor: rows.map((r) => r.id) };
}
