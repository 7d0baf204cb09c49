// Which of the functions a plan pins and the sites it excludes exist.
import { inArray } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { sites, sliceFunctions } from '../../../db/schema';

export async function selectExistingFunctionIds(db: Queryable, ids: string[]): Promise<Set<string>> {
  if (ids.length === 0) return new Set();
  const rows = await db.select({ id: sliceFunctions.id }).from(sliceFunctions).where(inArray(sliceFunctions.id, ids));
  return new Set(rows.map((r) => r.id));
}

export async function selectExistingSiteIds(db: Queryable, ids: string[]): Promise<Set<string>> {
  if (ids.length === 0) return new Set();
  const rows = await db.select({ id: sites.id }).from(sites).where(inArray(sites.id, ids));
  return new Set(rows.map((r) => r.id));
}
