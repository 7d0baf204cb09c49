// When an edit sends a window back to draft its accepted plan no longer holds (DESIGN §3): the link goes,
// the run itself stays listed (stale) for comparison.
import type { Queryable } from '../../../db/client';
import { clearAcceptedPlanId, selectAcceptedPlanId } from '../../queries/plans/plan-window';

/** Returns the plan id that was accepted, or null. */
export async function clearAcceptedPlan(tx: Queryable, windowId: string): Promise<string | null> {
  const planId = await selectAcceptedPlanId(tx, windowId);
  if (!planId) return null;
  await clearAcceptedPlanId(tx, windowId);
  return planId;
}
