// The slices each stored impact lists, for many windows at once: a campaign's spacing rule reads which slices the
// windows booked around it touch, without reading whole impacts (a big one is over a megabyte).
import { inArray, sql } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { windowImpacts } from '../../../db/schema';

/** window id → the affected slices' ids of its stored impact; absent when none is stored. */
export async function selectImpactSlices(db: Queryable, windowIds: string[]): Promise<Map<string, string[]>> {
  if (windowIds.length === 0) return new Map();
  const rows = await db.select({
    windowId: windowImpacts.windowId,
    slices: sql<string[]>`jsonb_path_query_array(${windowImpacts.impact}, '$.affected[*].slice')`,
  }).from(windowImpacts).where(inArray(windowImpacts.windowId, windowIds));
  return new Map(rows.map((r) => [r.windowId, r.slices]));
}
