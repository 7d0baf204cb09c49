// Reads every inventory table needed to rebuild the current scenario (current placements only).
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import {
  networkMeta, placements, sites, sliceFunctions, sliceTies, slices, spans, tenants,
} from '../../../db/schema';

export const NETWORK_META_ID = 'network';

/** Drizzle's transaction handle has rollback(); the pool-backed database has not. */
const isTransaction = (db: Queryable): boolean => 'rollback' in db;

/**
 * On the pool the eight reads run side by side; in a transaction (one connection) they run one after another, as
 * a pg client cannot run two queries at once.
 */
export async function selectScenarioTables(db: Queryable) {
  const reads = [
    () => db.select().from(sites),
    () => db.select().from(spans),
    () => db.select().from(tenants),
    () => db.select().from(slices),
    () => db.select().from(sliceFunctions),
    () => db.select().from(sliceTies),
    () => db.select({
      sliceId: placements.sliceId, revision: placements.revision, sites: placements.sites, paths: placements.paths,
    })
      .from(placements).where(eq(placements.current, true)),
    () => db.select({ name: networkMeta.name, outline: networkMeta.outline })
      .from(networkMeta).where(eq(networkMeta.id, NETWORK_META_ID)),
  ] as const;
  const [siteRows, spanRows, tenantRows, sliceRows, functionRows, tieRows, placementRows, metaRows] = isTransaction(db)
    ? [await reads[0](), await reads[1](), await reads[2](), await reads[3](),
      await reads[4](), await reads[5](), await reads[6](), await reads[7]()] as const
    : await Promise.all([reads[0](), reads[1](), reads[2](), reads[3](), reads[4](), reads[5](), reads[6](), reads[7]()]);
  return {
    siteRows, spanRows, tenantRows, sliceRows, functionRows, tieRows, placementRows, meta: metaRows[0] ?? null,
  };
}

export type ScenarioTables = Awaited<ReturnType<typeof selectScenarioTables>>;
