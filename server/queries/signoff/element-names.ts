// Names an approver reads instead of ids: tenants, sites, and the end sites of spans.
import { inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { sites, spans, tenants } from '../../../db/schema';

export async function selectTenantNames(db: Queryable, ids: string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await db.select({ id: tenants.id, name: tenants.name }).from(tenants).where(inArray(tenants.id, ids));
  return new Map(rows.map((r) => [r.id, r.name]));
}

export async function selectSiteNames(db: Queryable, ids: string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await db.select({ id: sites.id, name: sites.name }).from(sites).where(inArray(sites.id, ids));
  return new Map(rows.map((r) => [r.id, r.name]));
}

/** Each span's end sites (`a`, `b`), for the spans that exist. */
export async function selectSpanEnds(db: Queryable, ids: string[]): Promise<{ id: string; a: string; b: string }[]> {
  if (ids.length === 0) return [];
  return db.select({ id: spans.id, a: spans.siteA, b: spans.siteB }).from(spans).where(inArray(spans.id, ids));
}
