// Reads and writes `plans` rows (one per run of the re-mapper for a window) that are not tied to a run's attempt;
// the worker's attempt-guarded writes are in plan-run-rows.ts.
import { and, desc, eq, inArray } from 'drizzle-orm';
import { plans } from '../../../db/schema';
import type { PlanRunStatus, PlanSettings } from '../../../shared/plans';
import type { Queryable } from '../../../db/client';

const planColumns = {
  id: plans.id, windowId: plans.windowId, windowVersion: plans.windowVersion, status: plans.status,
  settings: plans.settings, progress: plans.progress, result: plans.result, error: plans.error, jobId: plans.jobId,
  attempts: plans.attempts, createdBy: plans.createdBy, createdAt: plans.createdAt, startedAt: plans.startedAt,
  finishedAt: plans.finishedAt, outageAccepted: plans.outageAccepted, acceptedAt: plans.acceptedAt, acceptedBy: plans.acceptedBy,
};

export async function selectPlanRow(db: Queryable, id: string, opts: { forUpdate?: boolean } = {}) {
  const query = db.select(planColumns).from(plans).where(eq(plans.id, id));
  const rows = opts.forUpdate ? await query.for('update') : await query;
  return rows[0] ?? null;
}
export type PlanRow = NonNullable<Awaited<ReturnType<typeof selectPlanRow>>>;

/** Newest first. */
export async function selectPlanRowsByWindow(db: Queryable, windowId: string): Promise<PlanRow[]> {
  return db.select(planColumns).from(plans).where(eq(plans.windowId, windowId)).orderBy(desc(plans.createdAt), desc(plans.id));
}

export async function insertPlanRow(db: Queryable, row: {
  id: string; windowId: string; windowVersion: number; settings: PlanSettings; createdBy: string; now: Date;
}): Promise<void> {
  await db.insert(plans).values({
    id: row.id, windowId: row.windowId, windowVersion: row.windowVersion, settings: row.settings,
    status: 'queued', createdBy: row.createdBy, createdAt: row.now,
  });
}

/** Moves a run to `failed`/`cancelled` only while it is still in one of `from` (a worker may have finished it). */
export async function endPlanRun(db: Queryable, id: string, change: {
  from: PlanRunStatus[]; to: 'failed' | 'cancelled'; error: string; now: Date;
}): Promise<boolean> {
  const updated = await db.update(plans)
    .set({ status: change.to, error: change.error, finishedAt: change.now })
    .where(and(eq(plans.id, id), inArray(plans.status, change.from)))
    .returning({ id: plans.id });
  return updated.length > 0;
}

export async function setPlanJobId(db: Queryable, id: string, jobId: string): Promise<void> {
  await db.update(plans).set({ jobId }).where(eq(plans.id, id));
}

export async function markPlanAccepted(db: Queryable, id: string, by: { userId: string; outageAccepted: string[]; now: Date }) {
  await db.update(plans)
    .set({ acceptedAt: by.now, acceptedBy: by.userId, outageAccepted: by.outageAccepted })
    .where(eq(plans.id, id));
}
