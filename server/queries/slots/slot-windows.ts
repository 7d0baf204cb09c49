// Active windows overlapping a slot search's range, with what the finder keys its re-map cache on (version,
// accepted plan) and the accepted plan's stored result. Elements come from selectElementsByWindow.
import { and, asc, eq, gt, inArray, lt } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { plans, windows } from '../../../db/schema';
import type { WindowStatus } from '../../../shared/windows';

/** Windows in one of `statuses` overlapping [from, to) (half-open), earliest first; `planResult` null without a plan. */
export async function selectWindowsInRange(db: Queryable, from: Date, to: Date, statuses: readonly WindowStatus[]) {
  return db.select({
    id: windows.id, title: windows.title, startsAt: windows.startsAt, endsAt: windows.endsAt,
    version: windows.version, acceptedPlanId: windows.acceptedPlanId, planResult: plans.result,
  }).from(windows)
    .leftJoin(plans, eq(plans.id, windows.acceptedPlanId))
    .where(and(gt(windows.endsAt, from), lt(windows.startsAt, to), inArray(windows.status, [...statuses])))
    .orderBy(asc(windows.startsAt), asc(windows.id));
}
export type SlotWindowRow = Awaited<ReturnType<typeof selectWindowsInRange>>[number];
