// Writes and reads of `campaigns` rows: created queued by the route, planned by the slot-search worker (guarded by
// the attempt like slot searches), then changed, booked or discarded by planners under optimistic locking.
import { and, desc, eq, inArray, lt, sql } from 'drizzle-orm';
import type { Queryable, Tx } from '../../../db/client';
import { campaigns, users } from '../../../db/schema';
import type { CampaignStatus, SearchProgress } from '../../../shared/slots';

export type CampaignRow = typeof campaigns.$inferSelect & { createdByName: string | null };

export async function insertCampaign(
  db: Queryable, row: { id: string; title: string; request: unknown; createdBy: string; now: Date },
): Promise<void> {
  await db.insert(campaigns).values({
    id: row.id, title: row.title, request: row.request, createdBy: row.createdBy, createdAt: row.now, updatedAt: row.now,
  });
}

function selectRows(db: Queryable) {
  return db.select({
    id: campaigns.id, title: campaigns.title, createdBy: campaigns.createdBy, request: campaigns.request,
    status: campaigns.status, version: campaigns.version, progress: campaigns.progress, schedule: campaigns.schedule,
    bookedWindowIds: campaigns.bookedWindowIds, error: campaigns.error, attempts: campaigns.attempts,
    createdAt: campaigns.createdAt, updatedAt: campaigns.updatedAt, heartbeatAt: campaigns.heartbeatAt, jobId: campaigns.jobId,
    createdByName: users.name,
  }).from(campaigns).leftJoin(users, eq(users.id, campaigns.createdBy));
}

export async function selectCampaign(db: Queryable, id: string): Promise<CampaignRow | null> {
  const [row] = await selectRows(db).where(eq(campaigns.id, id));
  return row ?? null;
}

/** Newest first; every status when `statuses` is absent. */
export async function selectCampaigns(db: Queryable, statuses: CampaignStatus[] | null, limit: number): Promise<CampaignRow[]> {
  const query = selectRows(db);
  const filtered = statuses ? query.where(inArray(campaigns.status, statuses)) : query;
  return filtered.orderBy(desc(campaigns.createdAt)).limit(limit);
}

/** The row, locked until the transaction ends (a booking and a change of the same draft never interleave). */
export async function lockCampaign(tx: Tx, id: string): Promise<CampaignRow | null> {
  const [row] = await selectRows(tx).where(eq(campaigns.id, id)).for('update', { of: campaigns });
  return row ?? null;
}

/**
 * Takes the planning for the pg-boss job `jobId`: `running`, one more attempt. Null when it is no longer queued or
 * running.
 */
export async function markCampaignRunning(
  db: Queryable, id: string, now: Date, progress: SearchProgress, jobId: string,
): Promise<number | null> {
  const [row] = await db.update(campaigns).set({
    status: 'running', attempts: sql`${campaigns.attempts} + 1`, heartbeatAt: sql`now()`, progress, error: null, updatedAt: now, jobId,
  }).where(and(eq(campaigns.id, id), inArray(campaigns.status, ['queued', 'running'])))
    .returning({ attempts: campaigns.attempts });
  return row?.attempts ?? null;
}

const ownedBy = (id: string, attempt: number) =>
  and(eq(campaigns.id, id), eq(campaigns.status, 'running'), eq(campaigns.attempts, attempt));

export async function beatCampaign(db: Queryable, id: string, attempt: number, progress: SearchProgress): Promise<boolean> {
  const rows = await db.update(campaigns).set({ heartbeatAt: sql`now()`, progress })
    .where(ownedBy(id, attempt)).returning({ id: campaigns.id });
  return rows.length > 0;
}

export async function finishCampaignDraft(
  db: Queryable, id: string, attempt: number, out: { schedule: unknown; progress: SearchProgress; now: Date },
): Promise<boolean> {
  const rows = await db.update(campaigns).set({ status: 'draft', schedule: out.schedule, progress: out.progress, updatedAt: out.now })
    .where(ownedBy(id, attempt)).returning({ id: campaigns.id });
  return rows.length > 0;
}

export async function finishCampaignFailed(db: Queryable, id: string, attempt: number, error: string, now: Date): Promise<boolean> {
  const rows = await db.update(campaigns).set({ status: 'failed', error, updatedAt: now })
    .where(ownedBy(id, attempt)).returning({ id: campaigns.id });
  return rows.length > 0;
}

export async function requeueCampaign(db: Queryable, id: string, attempt: number): Promise<void> {
  await db.update(campaigns).set({ status: 'queued', progress: null }).where(ownedBy(id, attempt));
}

/** Plannings `running` with a heartbeat older than `staleSeconds` (database clock) go back to `queued`, as for searches. */
export async function requeueStalledCampaigns(db: Queryable, staleSeconds: number): Promise<{ id: string; jobId: string | null }[]> {
  return db.update(campaigns).set({ status: 'queued', progress: null })
    .where(and(eq(campaigns.status, 'running'), lt(campaigns.heartbeatAt, sql`now() - make_interval(secs => ${staleSeconds})`)))
    .returning({ id: campaigns.id, jobId: campaigns.jobId });
}

/** Ends a planning that never finished (the queue refused it, or its retries are used up). */
export async function failUnfinishedCampaign(db: Queryable, id: string, error: string, now: Date): Promise<boolean> {
  const rows = await db.update(campaigns).set({ status: 'failed', error, updatedAt: now })
    .where(and(eq(campaigns.id, id), inArray(campaigns.status, ['queued', 'running']))).returning({ id: campaigns.id });
  return rows.length > 0;
}

/** A planner's change of a locked draft: the next version. */
export async function updateCampaign(
  tx: Tx, id: string, change: { title?: string; schedule?: unknown; status?: CampaignStatus; bookedWindowIds?: string[]; now: Date },
): Promise<number> {
  const [row] = await tx.update(campaigns).set({
    ...(change.title !== undefined ? { title: change.title } : {}),
    ...(change.schedule !== undefined ? { schedule: change.schedule } : {}),
    ...(change.status !== undefined ? { status: change.status } : {}),
    ...(change.bookedWindowIds !== undefined ? { bookedWindowIds: change.bookedWindowIds } : {}),
    version: sql`${campaigns.version} + 1`, updatedAt: change.now,
  }).where(eq(campaigns.id, id)).returning({ version: campaigns.version });
  return row.version;
}
