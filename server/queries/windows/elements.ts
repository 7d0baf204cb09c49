// Which of a window's element ids exist in the network, and which windows still take given elements out.
import { and, eq, inArray, notInArray } from 'drizzle-orm';
import { sites, spans, windowElements, windows } from '../../../db/schema';
import type { Queryable } from '../../../db/client';
import type { WindowStatus } from '../../../shared/windows';

/** The given elements that name no site/span, as "site x" / "span y" in input order. */
export async function findUnknownElements(db: Queryable, elements: { kind: 'site' | 'span'; id: string }[]): Promise<string[]> {
  const siteIds = elements.filter((e) => e.kind === 'site').map((e) => e.id);
  const spanIds = elements.filter((e) => e.kind === 'span').map((e) => e.id);
  const [siteRows, spanRows] = await Promise.all([
    siteIds.length ? db.select({ id: sites.id }).from(sites).where(inArray(sites.id, siteIds)) : [],
    spanIds.length ? db.select({ id: spans.id }).from(spans).where(inArray(spans.id, spanIds)) : [],
  ]);
  const known = new Set([...siteRows.map((r) => `site ${r.id}`), ...spanRows.map((r) => `span ${r.id}`)]);
  return elements.map((e) => `${e.kind} ${e.id}`).filter((key) => !known.has(key));
}

/** Each (window, element) pair where a window not in one of `closedStates` takes one of `elementIds` out. */
export async function selectWindowsUsingElements(
  db: Queryable, elementIds: string[], closedStates: readonly WindowStatus[],
): Promise<{ windowId: string; elementId: string }[]> {
  return db.selectDistinct({ windowId: windowElements.windowId, elementId: windowElements.elementId })
    .from(windowElements).innerJoin(windows, eq(windows.id, windowElements.windowId))
    .where(and(inArray(windowElements.elementId, elementIds), notInArray(windows.status, [...closedStates])));
}
