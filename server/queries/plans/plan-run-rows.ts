// The plan-run worker's reads and writes of `plans` rows. Every write after pick-up is guarded by the attempt
// number and `running`, so a cancelled run is never overwritten and a superseded attempt cannot write.
// Reads and writes not tied to an attempt (selectPlanRow, endPlanRun) are in plan-rows.ts.
import { and, eq, inArray, lt, sql } from 'drizzle-orm';
import type { Db } from '../../../db/client';
import { plans } from '../../../db/schema';
import type { PlanProgress, PlanReview } from '../../../shared/plans';

/** Takes the run: `running`, one more attempt. Null when it is no longer queued or running (cancelled, gone). */
export async function markRunning(db: Db, id: string, now: Date, progress: PlanProgress): Promise<number | null> {
  const [row] = await db.update(plans).set({
    status: 'running', attempts: sqlIncrement(), startedAt: now, heartbeatAt: sql`now()`, progress, error: null, finishedAt: null,
  }).where(and(eq(plans.id, id), inArray(plans.status, ['queued', 'running'])))
    .returning({ attempts: plans.attempts });
  return row?.attempts ?? null;
}

function sqlIncrement() {
  // drizzle has no increment helper; the expression keeps it one atomic UPDATE.
  return sql`${plans.attempts} + 1`;
}

const ownedBy = (id: string, attempt: number) =>
  and(eq(plans.id, id), eq(plans.status, 'running'), eq(plans.attempts, attempt));

/**
 * The attempt's heartbeat (on the database's clock, so workers on other machines compare alike), with new
 * progress when there is some. False when the run is no longer this attempt's (cancelled, or taken over).
 */
export async function beat(db: Db, id: string, attempt: number, progress: PlanProgress | null): Promise<boolean> {
  const rows = await db.update(plans).set({ heartbeatAt: sql`now()`, ...(progress ? { progress } : {}) })
    .where(ownedBy(id, attempt)).returning({ id: plans.id });
  return rows.length > 0;
}

export async function readRunState(db: Db, id: string): Promise<{ status: string; attempts: number } | null> {
  const [row] = await db.select({ status: plans.status, attempts: plans.attempts }).from(plans).where(eq(plans.id, id));
  return row ?? null;
}

export async function finishDone(
  db: Db, id: string, attempt: number, out: { review: PlanReview; progress: PlanProgress; now: Date },
): Promise<boolean> {
  const rows = await db.update(plans).set({ status: 'done', result: out.review, progress: out.progress, finishedAt: out.now })
    .where(ownedBy(id, attempt)).returning({ id: plans.id });
  return rows.length > 0;
}

/** Only while the run is still this attempt's. */
export async function finishFailed(db: Db, id: string, attempt: number, error: string, now: Date): Promise<boolean> {
  const rows = await db.update(plans).set({ status: 'failed', error, finishedAt: now })
    .where(ownedBy(id, attempt)).returning({ id: plans.id });
  return rows.length > 0;
}

/** Back to `queued` while the queue retries the job (a shutdown, or an error that may not happen again). */
export async function requeue(db: Db, id: string, attempt: number): Promise<void> {
  await db.update(plans).set({ status: 'queued', progress: null }).where(ownedBy(id, attempt));
}

/**
 * Runs still `running` whose heartbeat is older than `staleSeconds` (database clock) go back to `queued`; returns
 * them. The guarded UPDATE lets only one of several sweeping workers take a given run.
 */
export async function requeueStalledRuns(db: Db, staleSeconds: number) {
  return db.update(plans).set({ status: 'queued', progress: null })
    .where(and(eq(plans.status, 'running'), lt(plans.heartbeatAt, sql`now() - make_interval(secs => ${staleSeconds})`)))
    .returning({ planId: plans.id, jobId: plans.jobId, settings: plans.settings });
}
