// The audit log: one row per state change (who, what, when, before, after).
import type { Db } from '../../../db/client';
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
