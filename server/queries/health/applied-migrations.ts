// Which migrations the database has applied, as drizzle's migrator records them.
import { sql } from 'drizzle-orm';
import type { Db } from '../../../db/client';

const UNDEFINED_TABLE = '42P01';
const INVALID_SCHEMA_NAME = '3F000';

function pgCode(err: unknown): unknown {
  for (let e = err as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 3; e = e.cause as typeof e, depth++) {
    if (typeof e.code === 'string') return e.code;
  }
  return undefined;
}

/** The `created_at` (the journal's `when`, ms) of every applied migration; empty when none ever ran. */
export async function selectAppliedMigrations(db: Db): Promise<Set<number>> {
  try {
    const result = await db.execute<{ created_at: string | number }>(sql`select created_at from drizzle.__drizzle_migrations`);
    return new Set(result.rows.map((r) => Number(r.created_at)));
  } catch (err) {
    const code = pgCode(err);
    if (code === UNDEFINED_TABLE || code === INVALID_SCHEMA_NAME) return new Set();
    throw err;
  }
}
