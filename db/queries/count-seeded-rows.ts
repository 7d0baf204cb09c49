// Row counts of the tables the demo seed writes (setup's report and the seeding tests).
import { count } from 'drizzle-orm';
import type { PgTable } from 'drizzle-orm/pg-core';
import type { Db } from '../client';
import {
  tenants, sites, spans, slices, sliceFunctions, sliceTies, placements, windows, windowElements,
  users, passwordCredentials, roleGrants,
} from '../schema';

const SEEDED_TABLES: Record<string, PgTable> = {
  tenants, sites, spans, slices, functions: sliceFunctions, ties: sliceTies, placements,
  windows, windowElements, users, passwordCredentials, roleGrants,
};

export async function countSeededRows(db: Db): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const [name, table] of Object.entries(SEEDED_TABLES)) {
    const [row] = await db.select({ n: count() }).from(table);
    counts[name] = row?.n ?? 0;
  }
  return counts;
}
