// The window as sign-off sees it, and the windows waiting in review.
import { asc, eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { windows } from '../../../db/schema';

export type SignoffWindow = {
  id: string; title: string; workType: string | null; status: string; startsAt: Date; endsAt: Date;
  ownerId: string | null; reviewRound: number; acceptedPlanId: string | null;
};

/** `forUpdate` holds the window row until the transaction ends. Null when there is no such window. */
export async function selectSignoffWindow(db: Queryable, windowId: string, opts: { forUpdate?: boolean } = {}): Promise<SignoffWindow | null> {
  const query = db.select({
    id: windows.id, title: windows.title, workType: windows.workType, status: windows.status,
    startsAt: windows.startsAt, endsAt: windows.endsAt, ownerId: windows.ownerId,
    reviewRound: windows.reviewRound, acceptedPlanId: windows.acceptedPlanId,
  }).from(windows).where(eq(windows.id, windowId));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  return row ?? null;
}

/** Ids of the windows in review, soonest first. */
export async function selectWindowIdsInReview(db: Queryable): Promise<string[]> {
  const rows = await db.select({ id: windows.id }).from(windows).where(eq(windows.status, 'in-review')).orderBy(asc(windows.startsAt), asc(windows.id));
  return rows.map((r) => r.id);
}
