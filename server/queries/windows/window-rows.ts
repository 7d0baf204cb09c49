// Reads windows with their elements, owner, MOP details and stored-impact flag; inserts the window row and its
// elements (changes to an existing row go through window-status.ts).
import { and, asc, eq, gt, inArray, lt, ne, sql, type SQL } from 'drizzle-orm';
import type { Queryable, Tx } from '../../../db/client';
import { users, windowDocuments, windowElements, windowImpacts, windows } from '../../../db/schema';
import type { WindowStatus } from '../../../shared/windows';
import { windowTouchesTenant } from './tenant-footprint';


export type WindowFilter = {
  ids?: string[];
  from?: Date;
  to?: Date;
  ownerId?: string;
  statuses?: WindowStatus[];
  elementId?: string;
  affectsTenant?: string;
  /** tenant users: only windows touching this tenant's slices, never withdrawn ones */
  scopeTenant?: string | null;
};

export type ElementRow = { kind: 'site' | 'span'; id: string; effect: 'down' | 'reduced'; fraction: number | null };

function conditions(f: WindowFilter): SQL[] {
  const out: SQL[] = [];
  if (f.ids) out.push(inArray(windows.id, f.ids.length > 0 ? f.ids : ['']));
  if (f.from) out.push(gt(windows.endsAt, f.from));
  if (f.to) out.push(lt(windows.startsAt, f.to));
  if (f.ownerId) out.push(eq(windows.ownerId, f.ownerId));
  if (f.statuses) out.push(inArray(windows.status, f.statuses));
  if (f.elementId) {
    out.push(sql`exists (select 1 from window_elements we where we.window_id = "windows"."id" and we.element_id = ${f.elementId})`);
  }
  if (f.affectsTenant) out.push(windowTouchesTenant(f.affectsTenant));
  if (f.scopeTenant != null) out.push(windowTouchesTenant(f.scopeTenant), ne(windows.status, 'withdrawn'));
  return out;
}

/** From the stored impact; for a tenant user only its own critical slices count (no hint of others'). */
function touchesCritical(scopeTenant: string | null): SQL<boolean | null> {
  if (scopeTenant === null) return sql<boolean | null>`(${windowImpacts.impact} ->> 'touchesCritical')::boolean`;
  return sql<boolean | null>`exists (select 1 from jsonb_array_elements(${windowImpacts.impact} -> 'affected') a
    where (a ->> 'critical')::boolean and a -> 'tenant' ->> 'id' = ${scopeTenant})`;
}

export async function selectWindowRows(db: Queryable, filter: WindowFilter) {
  const rows = await db.select({
    id: windows.id, title: windows.title, startsAt: windows.startsAt, endsAt: windows.endsAt,
    workType: windows.workType, notes: windows.notes, status: windows.status, version: windows.version,
    ownerId: windows.ownerId, ownerName: users.name, freezeOverrideReason: windows.freezeOverrideReason,
    createdAt: windows.createdAt, updatedAt: windows.updatedAt,
    mopFileName: windowDocuments.fileName, mopMime: windowDocuments.mime,
    mopSizeBytes: windowDocuments.sizeBytes, mopUploadedAt: windowDocuments.uploadedAt,
    touchesCritical: touchesCritical(filter.scopeTenant ?? null),
    impactStored: sql<boolean>`${windowImpacts.windowId} is not null`,
  }).from(windows)
    .leftJoin(users, eq(users.id, windows.ownerId))
    .leftJoin(windowDocuments, eq(windowDocuments.windowId, windows.id))
    .leftJoin(windowImpacts, eq(windowImpacts.windowId, windows.id))
    .where(and(...conditions(filter)))
    .orderBy(asc(windows.startsAt), asc(windows.id));
  return rows;
}
export type WindowRow = Awaited<ReturnType<typeof selectWindowRows>>[number];

export async function selectElementsByWindow(db: Queryable, windowIds: string[]): Promise<Map<string, ElementRow[]>> {
  const out = new Map<string, ElementRow[]>(windowIds.map((id) => [id, []]));
  if (windowIds.length === 0) return out;
  const rows = await db.select().from(windowElements)
    .where(inArray(windowElements.windowId, windowIds))
    .orderBy(asc(windowElements.elementKind), asc(windowElements.elementId));
  for (const r of rows) {
    out.get(r.windowId)?.push({ kind: r.elementKind, id: r.elementId, effect: r.effect, fraction: r.fraction });
  }
  return out;
}

/** Active windows overlapping [from, to), for conflict checks (any owner, any tenant). */
export async function selectActiveOverlapping(db: Queryable, from: Date, to: Date, active: readonly WindowStatus[]) {
  return db.select({ id: windows.id, title: windows.title, startsAt: windows.startsAt, endsAt: windows.endsAt, status: windows.status })
    .from(windows)
    .where(and(gt(windows.endsAt, from), lt(windows.startsAt, to), inArray(windows.status, [...active])));
}

export type WindowWrite = {
  title: string; startsAt: Date; endsAt: Date; workType: string | null; notes: string | null;
  status: WindowStatus; freezeOverrideReason: string | null;
};

export async function insertWindowRow(tx: Tx, row: WindowWrite & { id: string; ownerId: string; now: Date }): Promise<void> {
  const { now, ...values } = row;
  await tx.insert(windows).values({ ...values, version: 1, createdAt: now, updatedAt: now });
}

export async function replaceElements(tx: Tx, windowId: string, elements: ElementRow[]): Promise<void> {
  await tx.delete(windowElements).where(eq(windowElements.windowId, windowId));
  if (elements.length === 0) return;
  await tx.insert(windowElements).values(elements.map((e) => ({
    windowId, elementKind: e.kind, elementId: e.id, effect: e.effect, fraction: e.effect === 'reduced' ? e.fraction : null,
  })));
}
