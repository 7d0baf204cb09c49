// Checks made when a plan is accepted: outages named, placements unchanged since the run, and the plan still
// verifying on the current network with the capacity other accepted plans hold.
import { verifyPlan } from '../../../planner/verify/verify-plan';
import type { PlacementView, PlanReview, PlanSlice } from '../../../shared/plans';
import type { Scenario } from '../../../shared/scenario';
import type { Queryable } from '../../../db/client';
import { currentInventory, type InventoryCache } from '../inventory/inventory-cache';
import { windowSpecOf } from '../windows/window-spec';
import { loadWindow } from '../windows/window-view';
import { OutageNotAcceptedError, PlanNotAcceptableError } from './errors';
import { reservationsFor, toSlicePlan } from './reservations';

/** How many violations a refusal spells out (the rest are counted). */
const LISTED_VIOLATIONS = 5;

export function checkOutageAccepted(review: PlanReview, outageAccepted: string[]): string[] {
  const unresolved = review.slices.filter((s) => s.outcome === 'unresolved').map((s) => s.slice);
  const named = new Set(outageAccepted);
  const missing = unresolved.filter((id) => !named.has(id));
  const extra = [...named].filter((id) => !unresolved.includes(id));
  if (missing.length > 0 || extra.length > 0) throw new OutageNotAcceptedError(missing, extra);
  return unresolved;
}

const sameStrings = (a: readonly string[] | undefined, b: readonly string[] | undefined) =>
  a !== undefined && b !== undefined && a.length === b.length && a.every((x, i) => x === b[i]);

function samePlacement(a: PlacementView, b: { sites: Record<string, string>; paths: Record<string, string[]> }): boolean {
  const siteKeys = Object.keys(a.sites);
  const pathKeys = Object.keys(a.paths);
  return siteKeys.length === Object.keys(b.sites).length && pathKeys.length === Object.keys(b.paths).length
    && siteKeys.every((k) => a.sites[k] === b.sites[k]) && pathKeys.every((k) => sameStrings(a.paths[k], b.paths[k]));
}

/** Affected slices whose current placement is no longer the one the plan started from (or that are gone). */
export function changedSlices(scenario: Scenario, slices: PlanSlice[]): string[] {
  const current = new Map(scenario.placements.map((p) => [p.slice, p]));
  return slices.filter((s) => {
    const now = current.get(s.slice);
    return now === undefined || !samePlacement(s.before, now);
  }).map((s) => s.slice);
}

/**
 * Throws NETWORK_CHANGED or PLAN_NO_LONGER_FITS with the reason; returns the windows whose plans were reserved.
 * WARNING: everything is read through the accept's own transaction. A second pool connection taken while the
 * transaction holds the accept lock and the window's row lock can wait forever once other requests of the process
 * hold every pool connection while waiting on those same locks. The process's cache is used only when the
 * transaction sees the revision it holds (one query on the transaction's own connection).
 */
export async function checkStillFits(
  tx: Queryable, windowId: string, review: PlanReview, cache?: InventoryCache,
): Promise<string[]> {
  const { scenario, inventory } = cache ? await cache.compiledIn(tx) : await currentInventory(tx);
  const changed = changedSlices(scenario, review.slices);
  if (changed.length > 0) {
    throw new PlanNotAcceptableError('NETWORK_CHANGED',
      `The placements of these slices changed after the run: ${changed.join(', ')}. Run the plan again.`);
  }
  const spec = windowSpecOf(await loadWindow(tx, windowId, null));
  const { reservations, reservedFor } = await reservationsFor(tx, windowId, inventory);
  const verdict = verifyPlan(inventory, spec, { affected: review.affected, slices: review.slices.map(toSlicePlan) }, reservations);
  if (!verdict.ok) {
    const listed = verdict.violations.slice(0, LISTED_VIOLATIONS).map((v) => (v.slice ? `${v.slice}: ${v.message}` : v.message));
    const more = verdict.violations.length - listed.length;
    const held = reservedFor.length > 0 ? ` Capacity held for the accepted plans of: ${reservedFor.join(', ')}.` : '';
    throw new PlanNotAcceptableError('PLAN_NO_LONGER_FITS',
      `The plan no longer fits the current network: ${listed.join('; ')}${more > 0 ? ` (and ${more} more)` : ''}.${held} Run the plan again.`);
  }
  return reservedFor;
}
