// When an edit sends a window back to draft its accepted plan no longer holds (DESIGN §3): the link goes,
// the run itself stays listed (stale) for comparison.
import { eq } from 'drizzle-orm';
import { windows } from '../../../db/schema';
import type { Queryable } from '../../../db/client';

/** Returns the plan id that was accepted, or null. */
export async function clearAcceptedPlan(tx: Queryable, windowId: string): Promise<string | null> {
  const [before] = await tx.select({ planId: windows.acceptedPlanId }).from(windows).where(eq(windows.id, windowId));
  if (!before?.planId) return null;
  await tx.update(windows).set({ acceptedPlanId: null }).where(eq(windows.id, windowId));
  return before.planId;
}
