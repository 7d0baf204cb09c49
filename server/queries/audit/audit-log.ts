// The audit log: one row per state change (who, what, when, before, after).
import { and, count, eq, gt } from 'drizzle-orm';
import type { Db, Queryable } from '../../../db/client';
import { auditLog } from '../../../db/schema';

export type AuditEntry = {
  actorId: string | null;
  action: string;
  entity: string;
  entityId?: string | null;
  before?: unknown;
  after?: unknown;
  at: Date;
};

/** Takes the pool or an open transaction (`Pick` keeps both assignable), so a change and its row commit together. */
export async function insertAuditEntry(db: Pick<Db, 'insert'>, entry: AuditEntry): Promise<void> {
  await db.insert(auditLog).values({
    actorId: entry.actorId,
    action: entry.action,
    entity: entry.entity,
    entityId: entry.entityId ?? null,
    before: entry.before ?? null,
    after: entry.after ?? null,
    at: entry.at,
  });
}

/** How many rows record `action` on one entity since `since` (e.g. failed codes within the lock-out window). */
export async function countAuditEntriesSince(
  db: Queryable, f: { action: string; entity: string; entityId: string; since: Date },
): Promise<number> {
  const [row] = await db.select({ n: count() }).from(auditLog)
    .where(and(eq(auditLog.entity, f.entity), eq(auditLog.entityId, f.entityId), eq(auditLog.action, f.action), gt(auditLog.at, f.since)));
  return row?.n ?? 0;
}
