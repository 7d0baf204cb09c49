// Names of the functions a plan moves and the end functions of the links it reroutes, for the change-board pack.
import { inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { sliceFunctions, sliceTies } from '../../../db/schema';

/** Function id → its name; functions without a name are left out (the caller words them). */
export async function selectFunctionNames(db: Queryable, ids: string[]): Promise<Map<string, string>> {
  if (ids.length === 0) return new Map();
  const rows = await db.select({ id: sliceFunctions.id, name: sliceFunctions.name }).from(sliceFunctions).where(inArray(sliceFunctions.id, ids));
  return new Map(rows.flatMap((r) => (r.name ? [[r.id, r.name] as const] : [])));
}

/** Tie id → the ids of the functions at its ends. */
export async function selectTieEnds(db: Queryable, ids: string[]): Promise<Map<string, { from: string; to: string }>> {
  if (ids.length === 0) return new Map();
  const rows = await db.select({ id: sliceTies.id, from: sliceTies.fromFunction, to: sliceTies.toFunction }).from(sliceTies).where(inArray(sliceTies.id, ids));
  return new Map(rows.map((r) => [r.id, { from: r.from, to: r.to }]));
}
