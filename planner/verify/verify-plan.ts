// Independent check of a move plan against every hard constraint of DESIGN §4.2; every planner result must pass it.
import type { Inventory, Reservation, SlicePlacement, SlicePlan, WindowSpec } from '../model/types';
import { fits } from '../model/tolerance';
import { addPlacementLoad, placementLoad, windowCapacity, type WindowCapacity } from '../model/window-capacity';
import { checkSlice } from './check-slice';
import type { VerifyResult, Violation } from './violation';

export type { Violation, VerifyResult } from './violation';

export interface PlanToVerify {
  affected: string[];
  slices: SlicePlan[];
}

/** Maps entries to slice indices; flags unknown, duplicate, missing and extra entries. */
function matchEntries(inv: Inventory, plan: PlanToVerify, out: Violation[]): Map<number, SlicePlan> {
  const affected = new Set(plan.affected);
  const entries = new Map<number, SlicePlan>();
  for (const entry of plan.slices) {
    const s = inv.sliceIndex.get(entry.slice);
    if (s === undefined) out.push({ slice: entry.slice, code: 'unknown-slice', message: `unknown slice "${entry.slice}"` });
    else if (entries.has(s)) out.push({ slice: entry.slice, code: 'duplicate-slice', message: 'more than one entry for this slice' });
    else if (!affected.has(entry.slice)) {
      out.push({ slice: entry.slice, code: 'extra-slice', message: 'entry for a slice the window does not affect' });
    } else entries.set(s, entry);
  }
  const present = new Set(plan.slices.map((e) => e.slice));
  for (const id of affected) {
    if (!inv.sliceIndex.has(id)) out.push({ slice: id, code: 'unknown-slice', message: `unknown affected slice "${id}"` });
    else if (!present.has(id)) out.push({ slice: id, code: 'missing-slice', message: 'affected slice has no entry' });
  }
  return entries;
}

/** A slice left without an entry keeps its current placement, so it must not touch the window's down elements. */
function checkUntouched(inv: Inventory, untouched: number[], cap: WindowCapacity, out: Violation[]): void {
  for (const s of untouched) {
    const p = inv.placements[s];
    const usesDown = p.sites.some((x) => cap.siteDown[x]) || p.paths.some((path) => path.some((x) => cap.spanDown[x]));
    if (usesDown) {
      out.push({ slice: inv.slices[s].id, code: 'missing-slice', message: 'slice uses a down element but has no entry' });
    }
  }
}

/** Down elements are reported as 'down-element' by the slice checks, not again here. */
function checkCapacity(
  inv: Inventory, cap: WindowCapacity, placed: Map<number, SlicePlacement | null>, untouched: number[], out: Violation[],
): void {
  const load = placementLoad(inv, untouched);
  for (const [s, placement] of placed) if (placement) addPlacementLoad(inv, s, placement, load);
  inv.network.sites.forEach((site, i) => {
    if (!cap.siteDown[i] && load.siteCpu[i] > 0 && !fits(load.siteCpu[i], cap.siteCpu[i])) {
      out.push({ code: 'cpu-capacity', message: `site "${site.id}" needs ${load.siteCpu[i]} vCPU of ${cap.siteCpu[i]}` });
    }
  });
  inv.network.spans.forEach((span, i) => {
    if (!cap.spanDown[i] && load.spanGbps[i] > 0 && !fits(load.spanGbps[i], cap.spanGbps[i])) {
      out.push({ code: 'bandwidth-capacity', message: `span "${span.id}" needs ${load.spanGbps[i]} Gbit/s of ${cap.spanGbps[i]}` });
    }
  });
}

/**
 * Verifies `plan` for `window`: capacity (with reservations), latency, availability, anchors, fixed functions,
 * down elements, path continuity, completeness, and exactly one entry per affected slice.
 * Slices without an entry keep their current placement and their load counts.
 */
export function verifyPlan(
  inv: Inventory, window: WindowSpec, plan: PlanToVerify, reservations?: Reservation,
): VerifyResult {
  const violations: Violation[] = [];
  const entries = matchEntries(inv, plan, violations);
  const cap = windowCapacity(inv, window, reservations);
  const placed = new Map<number, SlicePlacement | null>();
  for (const [s, entry] of entries) placed.set(s, checkSlice(inv, s, entry, cap, violations));
  const untouched = inv.slices.map((x) => x.index).filter((x) => !placed.has(x));
  checkUntouched(inv, untouched, cap, violations);
  checkCapacity(inv, cap, placed, untouched, violations);
  return { ok: violations.length === 0, violations };
}
