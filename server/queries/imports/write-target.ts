// Writes a diff inside an open transaction: upserts, slice bodies, new placement revisions, then deletions.
import { getTableColumns, inArray, sql, max, and, eq } from 'drizzle-orm';
import type { PgColumn, PgTable, PgUpdateSetSource } from 'drizzle-orm/pg-core';
import type { Tx } from '../../../db/client';
import { scenarioRows } from '../../../db/seed/scenario-rows';
import { networkMeta, placements, sites, sliceFunctions, slices, sliceTies, spans, tenants } from '../../../db/schema';
import type { ScenarioDiff } from '../../../shared/imports';
import type { Scenario } from '../../../shared/scenario';
import { NETWORK_META_ID } from '../inventory/scenario-tables';

const CHUNK_ROWS = 500; // stays far below PostgreSQL's 65 535 bind parameters per statement

async function upsert<T extends PgTable>(tx: Tx, table: T, key: PgColumn, rows: T['$inferInsert'][]): Promise<void> {
  const set = Object.fromEntries(Object.entries(getTableColumns(table))
    .filter(([, col]) => col.name !== key.name)
    .map(([prop, col]) => [prop, sql.raw(`excluded."${col.name}"`)]));
  for (let i = 0; i < rows.length; i += CHUNK_ROWS) {
    await tx.insert(table).values(rows.slice(i, i + CHUNK_ROWS)).onConflictDoUpdate({ target: key, set: set as PgUpdateSetSource<T> });
  }
}

async function insertChunks<T extends PgTable>(tx: Tx, table: T, rows: T['$inferInsert'][]): Promise<void> {
  for (let i = 0; i < rows.length; i += CHUNK_ROWS) await tx.insert(table).values(rows.slice(i, i + CHUNK_ROWS));
}

const touched = (d: { adds: string[]; changes: { id: string }[] }) => new Set([...d.adds, ...d.changes.map((c) => c.id)]);

/** The placement in force moves to a new revision; the old one stays as history. */
async function writePlacements(tx: Tx, rows: ReturnType<typeof scenarioRows>['placements'], ids: Set<string>, userId: string | null, now: Date) {
  const changed = rows.filter((p) => ids.has(p.sliceId));
  if (changed.length === 0) return;
  const sliceIds = changed.map((p) => p.sliceId);
  const latest = await tx.select({ sliceId: placements.sliceId, revision: max(placements.revision) })
    .from(placements).where(inArray(placements.sliceId, sliceIds)).groupBy(placements.sliceId);
  const revisionOf = new Map(latest.map((r) => [r.sliceId, r.revision ?? 0]));
  await tx.update(placements).set({ current: false }).where(and(inArray(placements.sliceId, sliceIds), eq(placements.current, true)));
  await insertChunks(tx, placements, changed.map((p) => ({
    ...p, revision: (revisionOf.get(p.sliceId) ?? 0) + 1, current: true, reason: 'import', createdBy: userId, createdAt: now,
  })));
}

export async function writeTarget(tx: Tx, target: Scenario, diff: ScenarioDiff, userId: string | null, now: Date): Promise<void> {
  const rows = scenarioRows(target, { windowShiftMs: 0, ownerId: null });
  const sliceIds = touched(diff.slices);
  await upsert(tx, tenants, tenants.id, rows.tenants.filter((r) => touched(diff.tenants).has(r.id)));
  await upsert(tx, sites, sites.id, rows.sites.filter((r) => touched(diff.sites).has(r.id)));
  await upsert(tx, spans, spans.id, rows.spans.filter((r) => touched(diff.spans).has(r.id)));
  if (diff.slices.removes.length > 0) await tx.delete(slices).where(inArray(slices.id, diff.slices.removes));
  if (sliceIds.size > 0) {
    // A slice's functions and ties are rewritten whole: simpler than a three-way diff, and ids stay the file's.
    await tx.delete(sliceTies).where(inArray(sliceTies.sliceId, [...sliceIds]));
    await tx.delete(sliceFunctions).where(inArray(sliceFunctions.sliceId, [...sliceIds]));
    await upsert(tx, slices, slices.id, rows.slices.filter((r) => sliceIds.has(r.id)));
    await insertChunks(tx, sliceFunctions, rows.functions.filter((r) => sliceIds.has(r.sliceId)));
    await insertChunks(tx, sliceTies, rows.ties.filter((r) => sliceIds.has(r.sliceId)));
  }
  await writePlacements(tx, rows.placements, touched(diff.placements), userId, now);
  if (diff.spans.removes.length > 0) await tx.delete(spans).where(inArray(spans.id, diff.spans.removes));
  if (diff.sites.removes.length > 0) await tx.delete(sites).where(inArray(sites.id, diff.sites.removes));
  if (diff.tenants.removes.length > 0) await tx.delete(tenants).where(inArray(tenants.id, diff.tenants.removes));
  if (diff.network.changes.length > 0) {
    const meta = { name: target.name ?? null, outline: target.outline ?? null, updatedAt: now };
    await tx.insert(networkMeta).values({ id: NETWORK_META_ID, ...meta }).onConflictDoUpdate({ target: networkMeta.id, set: meta });
  }
}
