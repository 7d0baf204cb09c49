// A tenant's notices that went out (never the blocked ones: the tenant has not been told yet), each with the
// stage of its window; the tenant views of windows, the calendar and the overview are built from these alone.
import { and, asc, eq, ne, sql, type SQL } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { notices, windows } from '../../../db/schema';

export type TenantNoticeFilter = {
  tenantId: string;
  /** only this window's notice */
  windowId?: string;
  /** work overlapping [from, to), by the times the notice gave the tenant */
  from?: Date;
  to?: Date;
  /** leave out cancellations (the calendar and the overview show only work that goes ahead) */
  activeOnly?: boolean;
};

const startsAt = sql`(${notices.content} ->> 'startsAt')::timestamptz`;
const endsAt = sql`(${notices.content} ->> 'endsAt')::timestamptz`;

function conditions(f: TenantNoticeFilter): SQL[] {
  const out: SQL[] = [eq(notices.tenantId, f.tenantId), ne(notices.status, 'blocked')];
  if (f.windowId !== undefined) out.push(eq(notices.windowId, f.windowId));
  if (f.from) out.push(sql`${endsAt} > ${f.from.toISOString()}::timestamptz`);
  if (f.to) out.push(sql`${startsAt} < ${f.to.toISOString()}::timestamptz`);
  if (f.activeOnly) out.push(eq(notices.method, 'REQUEST'), ne(windows.status, 'withdrawn'));
  return out;
}

export async function selectTenantNotices(db: Queryable, filter: TenantNoticeFilter) {
  return db.select({ notice: notices, windowStatus: windows.status })
    .from(notices).innerJoin(windows, eq(windows.id, notices.windowId))
    .where(and(...conditions(filter)))
    .orderBy(asc(startsAt), asc(notices.windowId));
}
export type TenantNoticeRow = Awaited<ReturnType<typeof selectTenantNotices>>[number];
