// Which of a window's element ids exist in the network.
import { inArray } from 'drizzle-orm';
import { sites, spans } from '../../../db/schema';
import type { Queryable } from '../../../db/client';

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
