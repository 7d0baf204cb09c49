// Test databases on the project's PostgreSQL: the run's shared one, and scratch ones per test file.
import { execFileSync } from 'node:child_process';
import path from 'node:path';
import pg from 'pg';
import { createDb, type Db } from '../../db/client';
import { migrateDatabase } from '../../db/migrate';

const ROOT = path.resolve(__dirname, '..', '..');

function pgScript(...args: string[]): string {
  return execFileSync('bash', [path.join(ROOT, 'scripts', 'pg.sh'), ...args], { encoding: 'utf8' }).trim();
}

/** TEST_DATABASE_URL (set by `npm test`), or else the local cluster's `slackwater_test`, created if missing. */
export function getTestDbUrl(): string {
  const fromEnv = process.env.TEST_DATABASE_URL;
  if (fromEnv) return fromEnv;
  pgScript('createdb', 'slackwater_test');
  return pgScript('url', 'slackwater_test');
}

export interface TestDb {
  db: Db;
  pool: pg.Pool;
  url: string;
  close(): Promise<void>;
}

// The same key as tests/server's harness, so parallel test files never migrate one database at once.
const MIGRATION_LOCK_KEY = 5_437_201;

/** The run's shared test database with migrations applied. */
export async function getTestDb(): Promise<TestDb> {
  const url = getTestDbUrl();
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query('select pg_advisory_lock($1)', [MIGRATION_LOCK_KEY]);
    await migrateDatabase(url);
  } finally {
    await client.query('select pg_advisory_unlock($1)', [MIGRATION_LOCK_KEY]).catch(() => undefined);
    await client.end();
  }
  const { db, pool } = createDb(url, { max: 4 });
  return { db, pool, url, close: () => pool.end() };
}

async function onServer(url: string, sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

/**
 * A fresh database `<test db>_<suffix>` beside the shared one, so tests that empty tables cannot
 * disturb the API tests running in parallel on the shared database. `close()` drops it.
 */
export async function createScratchDb(suffix: string, options: { migrate?: boolean } = {}): Promise<TestDb> {
  if (!/^[a-z0-9_]+$/.test(suffix)) throw new Error(`bad scratch database suffix: ${suffix}`);
  const baseUrl = getTestDbUrl();
  const base = new URL(baseUrl);
  const name = `${base.pathname.slice(1)}_${suffix}`;
  await onServer(baseUrl, `drop database if exists "${name}" with (force)`);
  await onServer(baseUrl, `create database "${name}"`);
  const url = new URL(baseUrl);
  url.pathname = `/${name}`;
  if (options.migrate !== false) await migrateDatabase(url.toString());
  const { db, pool } = createDb(url.toString(), { max: 4 });
  return {
    db, pool, url: url.toString(),
    close: async () => {
      await pool.end();
      await onServer(baseUrl, `drop database if exists "${name}" with (force)`);
    },
  };
}
