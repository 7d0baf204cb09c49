// The bench's throw-away database: made with scripts/pg.sh, migrated and seeded the way db/setup.ts does it
// (demo accounts and policies, then the network), dropped at the end.
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import pg from 'pg';
import { createDb } from '../../db/client';
import { migrateDatabase } from '../../db/migrate';
import { countSeededRows } from '../../db/queries/count-seeded-rows';
import { parseSetupEnv } from '../../db/setup-env';
import { runSetup } from '../../db/setup-run';
import type { Scenario } from '../../shared/scenario';

const ROOT = path.resolve(__dirname, '..', '..');
const PG_SH = path.join(ROOT, 'scripts', 'pg.sh');

function pgSh(...args: string[]): string {
  return execFileSync('bash', [PG_SH, ...args], { cwd: ROOT, encoding: 'utf8', stdio: ['ignore', 'pipe', 'inherit'] }).trim();
}

/** Starts the project's PostgreSQL if needed and makes an empty database; returns its URL. */
export function createBenchDatabase(name: string): string {
  pgSh('ensure');
  pgSh('recreatedb', name);
  return pgSh('url', name);
}

/** Drops the database even while connections are open (the server's, if it did not stop in time). */
export async function dropBenchDatabase(name: string): Promise<void> {
  const admin = new pg.Client({ connectionString: pgSh('url', 'postgres') });
  await admin.connect();
  try {
    await admin.query(`drop database if exists "${name}" with (force)`);
  } finally {
    await admin.end();
  }
}

/** Migrations, then db/setup-run with the given network in place of the demo file; answers the row counts. */
export async function seedBenchDatabase(url: string, scenario: Scenario): Promise<Record<string, number>> {
  await migrateDatabase(url);
  const { db, pool } = createDb(url, { max: 1 });
  try {
    await runSetup(db, parseSetupEnv({ SEED_DEMO: 'true' }), { now: new Date(), demoScenario: () => scenario, log: () => undefined });
    return await countSeededRows(db);
  } finally {
    await pool.end();
  }
}
