// Every placement revision of one slice, newest first.
import { desc, eq } from 'drizzle-orm';
import { placements } from '../../../db/schema';
import type { Queryable } from '../../../db/client';

export async function listPlacementRevisions(db: Queryable, { sliceId }: { sliceId: string }) {
  return db.select({
    revision: placements.revision, current: placements.current, reason: placements.reason,
    createdAt: placements.createdAt, sites: placements.sites, paths: placements.paths,
  }).from(placements).where(eq(placements.sliceId, sliceId)).orderBy(desc(placements.revision));
}
