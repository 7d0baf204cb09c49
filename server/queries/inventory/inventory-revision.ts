// The inventory revision: bumped by triggers on every write to the tables the compiled inventory reads
// (migration 0012), in the writing transaction, and announced on INVENTORY_CHANNEL at commit.
import { sql } from 'drizzle-orm';
import type { Queryable } from '../../../db/client';

/** The LISTEN/NOTIFY channel the triggers announce each new revision on (payload: the revision). */
export const INVENTORY_CHANNEL = 'slackwater_inventory';

/** The current revision as the caller's connection (or transaction) sees it; 0 before the first migration ran. */
export async function selectInventoryRevision(db: Queryable): Promise<number> {
  const result = await db.execute<{ revision: string }>(sql`select revision from inventory_state where id = 'inventory'`);
  return Number(result.rows[0]?.revision ?? 0);
}
