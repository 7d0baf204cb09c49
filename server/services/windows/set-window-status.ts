// The one way services outside the lifecycle route move a window to another state (plan accepted, sent for
// sign-off, cleared, returned, notified …): checks the state it is in, bumps the version, writes the audit row.
import { and, eq, inArray, sql } from 'drizzle-orm';
import { windows } from '../../../db/schema';
import type { WindowStatus } from '../../../shared/windows';
import { insertAuditEntry } from '../../queries/audit';
import type { Queryable } from '../../../db/client';
import { IllegalTransitionError } from './errors';

export interface StatusChange {
  windowId: string;
  /** the states the window may be in for this change; anything else is refused (409) */
  from: readonly WindowStatus[];
  to: WindowStatus;
  actorId: string | null;
  /** audit action, e.g. `plan.accept`, `signoff.submit` */
  action: string;
  now: Date;
  /** extra columns to set in the same update */
  set?: { acceptedPlanId?: string | null; reviewRound?: number };
  /** extra facts for the audit row's `after` */
  details?: Record<string, unknown>;
}

/** Run inside the caller's transaction; returns the new version. */
export async function setWindowStatus(tx: Queryable, c: StatusChange): Promise<number> {
  const [before] = await tx.select({ status: windows.status, version: windows.version })
    .from(windows).where(eq(windows.id, c.windowId)).for('update');
  if (!before) throw new IllegalTransitionError('(missing)', c.to, `window ${c.windowId} does not exist.`);
  if (!c.from.includes(before.status)) {
    throw new IllegalTransitionError(before.status, c.to, `This needs the window in: ${c.from.join(', ')}.`);
  }
  const [row] = await tx.update(windows)
    .set({ status: c.to, version: sql`${windows.version} + 1`, updatedAt: c.now, ...c.set })
    .where(and(eq(windows.id, c.windowId), inArray(windows.status, [...c.from])))
    .returning({ version: windows.version });
  await insertAuditEntry(tx, {
    actorId: c.actorId, action: c.action, entity: 'window', entityId: c.windowId, at: c.now,
    before: { status: before.status, version: before.version },
    after: { status: c.to, version: row.version, ...c.set, ...c.details },
  });
  return row.version;
}
