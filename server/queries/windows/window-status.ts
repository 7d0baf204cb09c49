// A window's state and version, read under a row lock, and the one update that moves its status.
import { and, eq, inArray, sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { windows } from '../../../db/schema';
import type { WindowStatus } from '../../../shared/windows';
import type { WindowWrite } from './window-rows';

export type WindowState = { status: WindowStatus; version: number };

/** Columns a status change may set alongside the status. */
export type WindowColumns = Partial<Omit<WindowWrite, 'status'>> & { acceptedPlanId?: string | null; reviewRound?: number };

/** The window's status and version; `forUpdate` holds the row until the transaction ends. Null when it does not exist. */
export async function selectWindowState(db: Queryable, id: string, opts: { forUpdate?: boolean } = {}): Promise<WindowState | null> {
  const query = db.select({ status: windows.status, version: windows.version }).from(windows).where(eq(windows.id, id));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  return row ?? null;
}

/**
 * Sets the status (and `set`), bumps the version; writes only while the window is still in one of `statuses`
 * and at `version` when given. Returns the new version, or null when nothing was written.
 */
export async function updateWindowStatus(
  tx: Queryable, id: string,
  change: { to: WindowStatus; now: Date; set?: WindowColumns },
  guard: { statuses?: readonly WindowStatus[]; version?: number },
): Promise<number | null> {
  const where: SQL[] = [eq(windows.id, id)];
  if (guard.statuses) where.push(inArray(windows.status, [...guard.statuses]));
  if (guard.version !== undefined) where.push(eq(windows.version, guard.version));
  const [row] = await tx.update(windows)
    .set({ ...change.set, status: change.to, version: sql`${windows.version} + 1`, updatedAt: change.now })
    .where(and(...where))
    .returning({ version: windows.version });
  return row?.version ?? null;
}
