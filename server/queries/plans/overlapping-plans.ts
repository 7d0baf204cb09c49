// Accepted plans of other windows overlapping a window in time: what a run for it must leave room for.
import { and, eq, gt, inArray, isNotNull, lt, ne } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { plans, windows } from '../../../db/schema';
import type { WindowStatus } from '../../../shared/windows';

/** Windows other than `windowId` in one of `statuses`, overlapping [startsAt, endsAt), with an accepted plan; by id. */
export async function selectOverlappingAcceptedPlans(
  db: Queryable, windowId: string, range: { startsAt: Date; endsAt: Date }, statuses: readonly WindowStatus[],
) {
  return db.select({
    id: windows.id, version: windows.version, startsAt: windows.startsAt, endsAt: windows.endsAt, result: plans.result,
  }).from(windows)
    .innerJoin(plans, eq(plans.id, windows.acceptedPlanId))
    .where(and(
      ne(windows.id, windowId), isNotNull(windows.acceptedPlanId),
      inArray(windows.status, [...statuses]),
      // half-open intervals: a window ending when this one starts does not overlap it
      gt(windows.endsAt, range.startsAt), lt(windows.startsAt, range.endsAt),
    ))
    .orderBy(windows.id);
}
