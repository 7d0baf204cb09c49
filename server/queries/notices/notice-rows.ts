// Rows of `notices`: one per window and tenant, rewritten in place for each new version.
import { and, asc, eq, gt, ne, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { notices, tenants, windows } from '../../../db/schema';
import type { NoticeMethod } from '../../../shared/notices';

export type NoticeRow = typeof notices.$inferSelect;
export type NewNoticeRow = typeof notices.$inferInsert;

export async function selectNotice(db: Queryable, id: string): Promise<NoticeRow | null> {
  const [row] = await db.select().from(notices).where(eq(notices.id, id));
  return row ?? null;
}

/** Holds the notice's row until the transaction ends (nothing when it does not exist). */
export async function lockNoticeRow(tx: Queryable, id: string): Promise<void> {
  await tx.select({ id: notices.id }).from(notices).where(eq(notices.id, id)).for('update');
}

/** The window's notices (only `method` ones when given), locked until the transaction ends. */
export async function lockWindowNotices(tx: Queryable, windowId: string, opts: { method?: NoticeMethod } = {}): Promise<NoticeRow[]> {
  const where: SQL[] = [eq(notices.windowId, windowId)];
  if (opts.method) where.push(eq(notices.method, opts.method));
  return tx.select().from(notices).where(and(...where)).for('update');
}

/** Ids of the window's invitations still held back for lead time. */
export async function selectBlockedInvitationIds(db: Queryable, windowId: string): Promise<string[]> {
  const rows = await db.select({ id: notices.id }).from(notices)
    .where(and(eq(notices.windowId, windowId), eq(notices.status, 'blocked'), eq(notices.method, 'REQUEST')));
  return rows.map((r) => r.id);
}

export async function insertNoticeRow(tx: Queryable, row: NewNoticeRow): Promise<void> {
  await tx.insert(notices).values(row);
}

export async function updateNoticeRow(tx: Queryable, id: string, set: Partial<Omit<NewNoticeRow, 'id'>>): Promise<void> {
  await tx.update(notices).set(set).where(eq(notices.id, id));
}

/** The window's notices with their tenant's name, by tenant name. */
export async function selectWindowNoticesWithTenant(db: Queryable, windowId: string) {
  return db.select({ n: notices, tenantName: tenants.name }).from(notices)
    .innerJoin(tenants, eq(tenants.id, notices.tenantId))
    .where(eq(notices.windowId, windowId)).orderBy(asc(tenants.name));
}

/** The tenant's notices that went out (not blocked) for windows not yet over, each with its window. */
export async function selectSentNoticesOfOpenWindows(db: Queryable, tenantId: string, now: Date) {
  return db.select().from(notices).innerJoin(windows, eq(windows.id, notices.windowId))
    .where(and(eq(notices.tenantId, tenantId), ne(notices.status, 'blocked'), gt(windows.endsAt, now)));
}
