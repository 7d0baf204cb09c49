// The audit trail: audit rows filtered by window, person, action and time, newest first, a page at a time, with
// the actor's name; and what the filters can offer. Read only: nothing here writes the log.
import { and, asc, count, desc, eq, gte, inArray, lt, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { auditLog, users, windows } from '../../../db/schema';
import { windowAuditScope } from './window-history';

export type AuditFilter = { windowId?: string; actorId?: string; action?: string; from?: Date; to?: Date };

export type AuditTrailRow = {
  id: number;
  at: Date;
  action: string;
  entity: string;
  entityId: string | null;
  actorName: string | null;
  before: unknown;
  after: unknown;
};

function whereOf(db: Queryable, f: AuditFilter): SQL | undefined {
  return and(
    f.windowId !== undefined ? windowAuditScope(db, f.windowId) : undefined,
    f.actorId !== undefined ? eq(auditLog.actorId, f.actorId) : undefined,
    f.action !== undefined ? eq(auditLog.action, f.action) : undefined,
    f.from ? gte(auditLog.at, f.from) : undefined,
    f.to ? lt(auditLog.at, f.to) : undefined,
  );
}

/** One page of rows, newest first (ties broken by id, so paging is stable), and how many rows match in all. */
export async function listAuditRows(
  db: Queryable, f: AuditFilter, page: { limit: number; offset: number },
): Promise<{ rows: AuditTrailRow[]; total: number }> {
  const where = whereOf(db, f);
  const rows = await db
    .select({
      id: auditLog.id, at: auditLog.at, action: auditLog.action, entity: auditLog.entity, entityId: auditLog.entityId,
      actorName: users.name, before: auditLog.before, after: auditLog.after,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(where)
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(page.limit)
    .offset(page.offset);
  const [{ n }] = await db.select({ n: count() }).from(auditLog).where(where);
  return { rows, total: n };
}

/** People who appear as actors, windows that have rows of their own, and the action codes written so far. */
export async function selectAuditChoices(db: Queryable): Promise<{
  people: { id: string; name: string }[]; windows: { id: string; title: string }[]; actions: string[];
}> {
  const actorIds = db.selectDistinct({ id: auditLog.actorId }).from(auditLog);
  const people = await db.select({ id: users.id, name: users.name }).from(users)
    .where(inArray(users.id, actorIds)).orderBy(asc(users.name), asc(users.id));
  const windowIds = db.selectDistinct({ id: auditLog.entityId }).from(auditLog).where(eq(auditLog.entity, 'window'));
  const windowRows = await db.select({ id: windows.id, title: windows.title }).from(windows)
    .where(inArray(windows.id, windowIds)).orderBy(desc(windows.startsAt), asc(windows.id));
  const actions = await db.selectDistinct({ action: auditLog.action }).from(auditLog).orderBy(asc(auditLog.action));
  return { people, windows: windowRows, actions: actions.map((a) => a.action) };
}
