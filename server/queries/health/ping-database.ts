// The database round trip readiness asks for.
import { sql } from 'drizzle-orm';
import type { Db } from '../../../db/client';

/** `select 1`: resolves when the database answers a query; rejects with the driver's error when it does not. */
export async function selectOne(db: Db): Promise<void> {
  await db.execute(sql`select 1`);
}
