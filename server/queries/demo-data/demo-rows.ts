// Reads for demo removal: which of the demo's ids are still in the database, and the rows that depend on them.
import { and, count, eq, inArray, or, sql } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import {
  networkMeta, notices, placements, plans, signoffs, sites, slices, spans, ssoSettings, tenants, users, windowElements, windows,
} from '../../../db/schema';

const idsOf = (rows: { id: string }[]) => rows.map((r) => r.id);

export async function selectPresentSiteIds(db: Queryable, ids: string[]): Promise<string[]> {
  return idsOf(await db.select({ id: sites.id }).from(sites).where(inArray(sites.id, ids)));
}

/** The demo's spans plus every span with an end on one of `siteIds` (it cannot outlive its site). */
export async function selectSpanIdsFor(db: Queryable, { spanIds, siteIds }: { spanIds: string[]; siteIds: string[] }): Promise<string[]> {
  return idsOf(await db.select({ id: spans.id }).from(spans)
    .where(or(inArray(spans.id, spanIds), inArray(spans.siteA, siteIds), inArray(spans.siteB, siteIds))));
}

export async function selectPresentTenantIds(db: Queryable, ids: string[]): Promise<string[]> {
  return idsOf(await db.select({ id: tenants.id }).from(tenants).where(inArray(tenants.id, ids)));
}

/** The demo's slices plus every slice of `tenantIds` (a slice cannot outlive its tenant). */
export async function selectSliceIdsFor(db: Queryable, { sliceIds, tenantIds }: { sliceIds: string[]; tenantIds: string[] }): Promise<string[]> {
  return idsOf(await db.select({ id: slices.id }).from(slices).where(or(inArray(slices.id, sliceIds), inArray(slices.tenantId, tenantIds))));
}

export type CurrentPlacement = { sliceId: string; sites: Record<string, string>; paths: Record<string, string[]> };

/** Every slice's placement in force (to find other slices living on elements that go). */
export async function selectCurrentPlacements(db: Queryable): Promise<CurrentPlacement[]> {
  return db.select({ sliceId: placements.sliceId, sites: placements.sites, paths: placements.paths })
    .from(placements).where(eq(placements.current, true));
}

export async function countPlacementsOf(db: Queryable, sliceIds: string[]): Promise<number> {
  const [row] = await db.select({ n: count() }).from(placements).where(inArray(placements.sliceId, sliceIds));
  return row?.n ?? 0;
}

/** The demo's windows plus every window that takes out one of the sites or spans that go. */
export async function selectWindowIdsFor(
  db: Queryable, { windowIds, siteIds, spanIds }: { windowIds: string[]; siteIds: string[]; spanIds: string[] },
): Promise<string[]> {
  const touching = db.selectDistinct({ id: windowElements.windowId }).from(windowElements).where(or(
    and(eq(windowElements.elementKind, 'site'), inArray(windowElements.elementId, siteIds)),
    and(eq(windowElements.elementKind, 'span'), inArray(windowElements.elementId, spanIds)),
  ));
  return idsOf(await db.select({ id: windows.id }).from(windows)
    .where(or(inArray(windows.id, windowIds), sql`${windows.id} in (${touching})`)));
}

export async function countPlansOf(db: Queryable, windowIds: string[]): Promise<number> {
  const [row] = await db.select({ n: count() }).from(plans).where(inArray(plans.windowId, windowIds));
  return row?.n ?? 0;
}

export async function countNoticesOf(db: Queryable, { windowIds, tenantIds }: { windowIds: string[]; tenantIds: string[] }): Promise<number> {
  const [row] = await db.select({ n: count() }).from(notices)
    .where(or(inArray(notices.windowId, windowIds), inArray(notices.tenantId, tenantIds)));
  return row?.n ?? 0;
}

export async function countSignoffsOf(db: Queryable, { windowIds, approverIds }: { windowIds: string[]; approverIds: string[] }): Promise<number> {
  const [row] = await db.select({ n: count() }).from(signoffs)
    .where(or(inArray(signoffs.windowId, windowIds), inArray(signoffs.approverId, approverIds)));
  return row?.n ?? 0;
}

export type AccountRow = { id: string; email: string; name: string; tenantId: string | null };

/** Demo accounts (by id or e-mail) and the accounts of tenants that go. */
export async function selectAccountsFor(
  db: Queryable, { ids, emails, tenantIds }: { ids: string[]; emails: string[]; tenantIds: string[] },
): Promise<AccountRow[]> {
  return db.select({ id: users.id, email: users.email, name: users.name, tenantId: users.tenantId }).from(users).where(or(
    inArray(users.id, ids), inArray(sql<string>`lower(${users.email})`, emails), inArray(users.tenantId, tenantIds),
  )).orderBy(users.email);
}

/** Whether single sign-on is still the demo's: the local test issuer with the demo's client. */
export async function ssoSettingsAre(db: Queryable, { issuerUrl, clientId }: { issuerUrl: string; clientId: string }): Promise<boolean> {
  const rows = await db.select({ id: ssoSettings.id }).from(ssoSettings)
    .where(and(eq(ssoSettings.issuerUrl, issuerUrl), eq(ssoSettings.clientId, clientId)));
  return rows.length > 0;
}

/** Whether the map's name and outline are the demo's (by its name). */
export async function networkMetaNamed(db: Queryable, name: string | null): Promise<boolean> {
  if (name === null) return false;
  const rows = await db.select({ id: networkMeta.id }).from(networkMeta).where(and(eq(networkMeta.id, 'network'), eq(networkMeta.name, name)));
  return rows.length > 0;
}
