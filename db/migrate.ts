// Applies the committed drizzle-kit migrations in db/migrations.
import fs from 'node:fs';
import path from 'node:path';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { createDb } from './client';

export const MIGRATIONS_FOLDER = path.resolve(__dirname, 'migrations');

export async function migrateDatabase(url: string): Promise<void> {
  const { db, pool } = createDb(url, { max: 1 });
  try {
    await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
  } finally {
    await pool.end();
  }
}

export type CommittedMigration = { tag: string; createdAtMs: number };

/**
 * The migrations committed in db/migrations (drizzle-kit's journal), oldest first. The migrator records each
 * applied one with the journal's `when` as `created_at`, which is how readiness tells what is missing.
 */
export function readCommittedMigrations(): CommittedMigration[] {
  const journal = JSON.parse(fs.readFileSync(path.join(MIGRATIONS_FOLDER, 'meta', '_journal.json'), 'utf8')) as {
    entries: { tag: string; when: number }[];
  };
  return journal.entries.map((e) => ({ tag: e.tag, createdAtMs: e.when }));
}
