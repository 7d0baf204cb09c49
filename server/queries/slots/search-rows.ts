// Writes and reads of `slot_searches` rows: the route inserts a queued search, the slot-search worker takes it,
// beats and stores its outcome. Writes after pick-up are guarded by the attempt and `running`, so an attempt that
// was given up (its job expired and retried elsewhere) cannot overwrite a newer one.
import { and, eq, inArray, lt, sql } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { slotSearches } from '../../../db/schema';
import type { SearchProgress, SlotSearchRequest } from '../../../shared/slots';

export type SlotSearchRow = typeof slotSearches.$inferSelect;

export async function insertSlotSearch(
  db: Queryable, row: { id: string; request: SlotSearchRequest; createdBy: string; now: Date },
): Promise<void> {
  await db.insert(slotSearches).values({ id: row.id, request: row.request, createdBy: row.createdBy, createdAt: row.now });
}

export async function selectSlotSearch(db: Queryable, id: string): Promise<SlotSearchRow | null> {
  const [row] = await db.select().from(slotSearches).where(eq(slotSearches.id, id));
  return row ?? null;
}

/**
 * Takes the search for the pg-boss job `jobId`: `running`, one more attempt. Null when it is no longer queued or
 * running.
 */
export async function markSearchRunning(
  db: Queryable, id: string, now: Date, progress: SearchProgress, jobId: string,
): Promise<number | null> {
  const [row] = await db.update(slotSearches).set({
    status: 'running', attempts: sql`${slotSearches.attempts} + 1`, startedAt: now, heartbeatAt: sql`now()`,
    progress, error: null, finishedAt: null, jobId,
  }).where(and(eq(slotSearches.id, id), inArray(slotSearches.status, ['queued', 'running'])))
    .returning({ attempts: slotSearches.attempts });
  return row?.attempts ?? null;
}

const ownedBy = (id: string, attempt: number) =>
  and(eq(slotSearches.id, id), eq(slotSearches.status, 'running'), eq(slotSearches.attempts, attempt));

/** New progress and a heartbeat (database clock); false when the search is no longer this attempt's. */
export async function beatSearch(db: Queryable, id: string, attempt: number, progress: SearchProgress): Promise<boolean> {
  const rows = await db.update(slotSearches).set({ heartbeatAt: sql`now()`, progress })
    .where(ownedBy(id, attempt)).returning({ id: slotSearches.id });
  return rows.length > 0;
}

export async function finishSearchDone(
  db: Queryable, id: string, attempt: number, out: { result: unknown; progress: SearchProgress; now: Date },
): Promise<boolean> {
  const rows = await db.update(slotSearches).set({ status: 'done', result: out.result, progress: out.progress, finishedAt: out.now })
    .where(ownedBy(id, attempt)).returning({ id: slotSearches.id });
  return rows.length > 0;
}

export async function finishSearchFailed(db: Queryable, id: string, attempt: number, error: string, now: Date): Promise<boolean> {
  const rows = await db.update(slotSearches).set({ status: 'failed', error, finishedAt: now })
    .where(ownedBy(id, attempt)).returning({ id: slotSearches.id });
  return rows.length > 0;
}

/** Back to `queued` while the queue retries the job. */
export async function requeueSearch(db: Queryable, id: string, attempt: number): Promise<void> {
  await db.update(slotSearches).set({ status: 'queued', progress: null }).where(ownedBy(id, attempt));
}

/**
 * Searches `running` whose heartbeat is older than `staleSeconds` (database clock) go back to `queued`; returns them
 * with the job that was working them. Guarded by the status, so of several sweeping workers only one takes a search.
 */
export async function requeueStalledSearches(db: Queryable, staleSeconds: number): Promise<{ id: string; jobId: string | null }[]> {
  return db.update(slotSearches).set({ status: 'queued', progress: null })
    .where(and(eq(slotSearches.status, 'running'), lt(slotSearches.heartbeatAt, sql`now() - make_interval(secs => ${staleSeconds})`)))
    .returning({ id: slotSearches.id, jobId: slotSearches.jobId });
}

/** Ends a search that never finished (the queue refused it, or its retries are used up), whatever attempt holds it. */
export async function failUnfinishedSearch(db: Queryable, id: string, error: string, now: Date): Promise<boolean> {
  const rows = await db.update(slotSearches).set({ status: 'failed', error, finishedAt: now })
    .where(and(eq(slotSearches.id, id), inArray(slotSearches.status, ['queued', 'running']))).returning({ id: slotSearches.id });
  return rows.length > 0;
}
