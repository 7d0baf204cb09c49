// Reads only what the GraphML export writes: sites, spans and the network's name (no slices, tenants or placements).
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import { networkMeta, sites, spans } from '../../../db/schema';
import { NETWORK_META_ID } from './scenario-tables';

export async function selectGraphmlTables(db: Queryable) {
  // One after another: also safe on a transaction's single connection, and there are only three small reads.
  const siteRows = await db.select().from(sites);
  const spanRows = await db.select().from(spans);
  const metaRows = await db.select({ name: networkMeta.name }).from(networkMeta).where(eq(networkMeta.id, NETWORK_META_ID));
  return { siteRows, spanRows, name: metaRows[0]?.name ?? null };
}

export type GraphmlTables = Awaited<ReturnType<typeof selectGraphmlTables>>;
