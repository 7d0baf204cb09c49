// Independent check of a move plan against every hard constraint of DESIGN §4.2; every planner result must pass it.
// Capacity, load, tolerance and anchors are the verifier's own (window-limits, load-tally, check-capacity,
// anchor-holds): it must not share them with the planner, or one bug would pass both.
import type { Inventory, Reservation, SlicePlacement, WindowSpec } from '../model/types';
import { checkCapacity } from './check-capacity';
import { checkSlice } from './check-slice';
import { tallyLoad } from './load-tally';
import { matchEntries, type PlanToVerify } from './match-entries';
import type { VerifyResult, Violation } from './violation';
import { windowLimits, type WindowLimits } from './window-limits';

export type { Violation, VerifyResult } from './violation';
export type { PlanToVerify } from './match-entries';

/** A slice left without an entry keeps its current placement, so it must not touch the window's down elements. */
function checkUntouched(inv: Inventory, entered: ReadonlyMap<number, unknown>, limits: WindowLimits, out: Violation[]): void {
  for (const slice of inv.slices) {
    if (entered.has(slice.index)) continue;
    const p = inv.placements[slice.index];
    const usesDown = p.sites.some((x) => limits.siteDown[x]) || p.paths.some((path) => path.some((x) => limits.spanDown[x]));
    if (usesDown) out.push({ slice: slice.id, code: 'missing-slice', message: 'slice uses a down element but has no entry' });
  }
}

/**
 * Verifies `plan` for `window`: capacity (with reservations), latency, availability, anchors, fixed functions,
 * down elements, path continuity, completeness, exactly one entry per affected slice, and the knock-on rules for
 * entries of slices the window does not affect. Slices without an entry keep their current placement and load.
 */
export function verifyPlan(
  inv: Inventory, window: WindowSpec, plan: PlanToVerify, reservations?: Reservation,
): VerifyResult {
  const violations: Violation[] = [];
  const entries = matchEntries(inv, plan, violations);
  const limits = windowLimits(inv, window, reservations, violations);
  const placed = new Map<number, SlicePlacement | null>();
  for (const [s, entry] of entries) placed.set(s, checkSlice(inv, s, entry, limits, violations));
  checkUntouched(inv, placed, limits, violations);
  checkCapacity(inv, limits, tallyLoad(inv, placed), violations);
  return { ok: violations.length === 0, violations };
}
