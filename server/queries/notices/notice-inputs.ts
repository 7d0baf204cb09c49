// What composing a window's notices reads: the window, slices and tenants by id, and the rows that turn
// sites, spans, functions and ties into tenant-facing words.
import { eq, inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { sites, sliceFunctions, sliceTies, slices, spans, tenants, windows } from '../../../db/schema';

/** `inArray` with an empty list is refused by drizzle; '' matches no id. */
const anyOf = (ids: string[]) => (ids.length > 0 ? ids : ['']);

export async function selectNoticeWindow(db: Queryable, windowId: string) {
  const [w] = await db.select({
    id: windows.id, startsAt: windows.startsAt, endsAt: windows.endsAt, workType: windows.workType,
    status: windows.status, acceptedPlanId: windows.acceptedPlanId,
  }).from(windows).where(eq(windows.id, windowId));
  return w ?? null;
}

export async function selectSlicesByIds(db: Queryable, ids: string[]) {
  return db.select().from(slices).where(inArray(slices.id, ids));
}

export async function selectTenantsByIds(db: Queryable, ids: string[]) {
  return db.select().from(tenants).where(inArray(tenants.id, anyOf(ids)));
}

/** One query after another: inside a transaction there is one connection (pg refuses overlapping queries on it). */
export async function selectWordingRows(db: Queryable, ids: { siteIds: string[]; spanIds: string[]; sliceIds: string[] }) {
  const siteRows = await db.select({ id: sites.id, lat: sites.lat, lon: sites.lon }).from(sites).where(inArray(sites.id, anyOf(ids.siteIds)));
  const spanRows = await db.select({ id: spans.id, latencyMs: spans.latencyMs, lengthKm: spans.lengthKm })
    .from(spans).where(inArray(spans.id, anyOf(ids.spanIds)));
  const fnRows = await db.select({ id: sliceFunctions.id, name: sliceFunctions.name })
    .from(sliceFunctions).where(inArray(sliceFunctions.sliceId, anyOf(ids.sliceIds)));
  const tieRows = await db.select().from(sliceTies).where(inArray(sliceTies.sliceId, anyOf(ids.sliceIds)));
  return { siteRows, spanRows, fnRows, tieRows };
}
