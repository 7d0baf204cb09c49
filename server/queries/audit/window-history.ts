// A window's audit rows, oldest first, with the actor's name: the window's own rows and the rows of its plan runs.
// The audit trail's window filter reads the same rows through windowAuditScope, so both always agree.
import { and, asc, eq, inArray, or, sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { auditLog, plans, users } from '../../../db/schema';

export type WindowAuditRow = {
  id: number;
  at: Date;
  action: string;
  entity: string;
  actorName: string | null;
  after: unknown;
};

/** Plan-run rows that belong in a window's history (acceptance is recorded on the window itself as well). */
const PLAN_ACTIONS = ['plan.enqueue', 'plan.cancel', 'plan.fail'];

/** Which audit rows belong to a window: its own rows and its plan runs' rows. */
export function windowAuditScope(db: Queryable, windowId: string): SQL {
  const runsOfWindow = db.select({ id: plans.id }).from(plans).where(eq(plans.windowId, windowId));
  return or(
    and(eq(auditLog.entity, 'window'), eq(auditLog.entityId, windowId)),
    and(eq(auditLog.entity, 'plan'), inArray(auditLog.action, PLAN_ACTIONS), sql`${auditLog.entityId} in (${runsOfWindow})`),
  ) as SQL;
}

export async function selectWindowAuditRows(db: Queryable, windowId: string): Promise<WindowAuditRow[]> {
  return db
    .select({
      id: auditLog.id, at: auditLog.at, action: auditLog.action, entity: auditLog.entity,
      actorName: users.name, after: auditLog.after,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(windowAuditScope(db, windowId))
    .orderBy(asc(auditLog.at), asc(auditLog.id));
}
