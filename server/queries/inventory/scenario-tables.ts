// Reads every inventory table needed to rebuild the current scenario (current placements only).
import { eq } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';
import {
  networkMeta, placements, sites, sliceFunctions, sliceTies, slices, spans, tenants,
} from '../../../db/schema';


export const NETWORK_META_ID = 'network';

export async function selectScenarioTables(db: Queryable) {
  const [siteRows, spanRows, tenantRows, sliceRows, functionRows, tieRows, placementRows, metaRows] = await Promise.all([
    db.select().from(sites),
    db.select().from(spans),
    db.select().from(tenants),
    db.select().from(slices),
    db.select().from(sliceFunctions),
    db.select().from(sliceTies),
    db.select({
      sliceId: placements.sliceId, revision: placements.revision, sites: placements.sites, paths: placements.paths,
    })
      .from(placements).where(eq(placements.current, true)),
    db.select({ name: networkMeta.name, outline: networkMeta.outline })
      .from(networkMeta).where(eq(networkMeta.id, NETWORK_META_ID)),
  ]);
  return {
    siteRows, spanRows, tenantRows, sliceRows, functionRows, tieRows, placementRows, meta: metaRows[0] ?? null,
  };
}

export type ScenarioTables = Awaited<ReturnType<typeof selectScenarioTables>>;
