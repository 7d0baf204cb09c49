// What plans read and write on their window's row: the facts a plan's standing depends on, its times, and the
// link to its accepted plan.
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { windowImpacts, windows } from '../../../db/schema';
import type { WindowStatus } from '../../../shared/windows';

/** What a plan's standing depends on: the window's state and the version its stored impact was computed for. */
export type WindowFacts = {
  id: string; status: WindowStatus; version: number; acceptedPlanId: string | null;
  /** null when no impact is stored (an edit dropped it) */
  impactVersion: number | null;
};

/** `forUpdate` locks the window row (not its impact). Null when there is no such window. */
export async function selectWindowFacts(db: Queryable, windowId: string, opts: { forUpdate?: boolean } = {}): Promise<WindowFacts | null> {
  const query = db.select({
    id: windows.id, status: windows.status, version: windows.version, acceptedPlanId: windows.acceptedPlanId,
    impactVersion: windowImpacts.windowVersion,
  }).from(windows).leftJoin(windowImpacts, eq(windowImpacts.windowId, windows.id)).where(eq(windows.id, windowId));
  const [row] = opts.forUpdate ? await query.for('update', { of: windows }) : await query;
  return row ?? null;
}

export async function selectWindowTimes(db: Queryable, windowId: string): Promise<{ startsAt: Date; endsAt: Date } | null> {
  const [row] = await db.select({ startsAt: windows.startsAt, endsAt: windows.endsAt }).from(windows).where(eq(windows.id, windowId));
  return row ?? null;
}

/** Null when the window has no accepted plan (or does not exist). */
export async function selectAcceptedPlanId(db: Queryable, windowId: string): Promise<string | null> {
  const [row] = await db.select({ planId: windows.acceptedPlanId }).from(windows).where(eq(windows.id, windowId));
  return row?.planId ?? null;
}

export async function clearAcceptedPlanId(tx: Queryable, windowId: string): Promise<void> {
  await tx.update(windows).set({ acceptedPlanId: null }).where(eq(windows.id, windowId));
}
