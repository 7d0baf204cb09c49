// A scratch database next to the test database, migrated and seeded with the demo scenario once, so plan runs
// compute on a known network and no other test file's rows (the shared test database) end up in them.
import fs from 'node:fs';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import pg from 'pg';
import type { Db } from '../../../../db/client';
import { createDb } from '../../../../db/client';
import { migrateDatabase } from '../../../../db/migrate';
import { plans, windows } from '../../../../db/schema';
import { seedDemo } from '../../../../db/seed';
import { planSettingsSchema, type PlanSettingsInput } from '../../../../shared/plans';
import { testConfig, testDatabaseUrl } from '../../helpers/test-app';

/** Any fixed number, different from the test database's migration lock. */
const DEMO_DB_LOCK_KEY = 5_437_202;
const DEMO_FILE = path.resolve(__dirname, '../../../../scenarios/demo.json');

let ready: Promise<string> | null = null;

/** postgres://…/<test db>_jobs_demo, created, migrated and seeded on first use (idempotent across files). */
export function demoDatabaseUrl(): Promise<string> {
  ready ??= (async () => {
    const base = new URL(testDatabaseUrl());
    const name = `${base.pathname.slice(1)}_jobs_demo`;
    const url = new URL(base);
    url.pathname = `/${name}`;
    const client = new pg.Client({ connectionString: base.toString() });
    await client.connect();
    try {
      await client.query('select pg_advisory_lock($1)', [DEMO_DB_LOCK_KEY]);
      const { rowCount } = await client.query('select 1 from pg_database where datname = $1', [name]);
      if (rowCount === 0) await client.query(`create database "${name}"`);
      await migrateAndSeed(url.toString());
    } finally {
      await client.query('select pg_advisory_unlock($1)', [DEMO_DB_LOCK_KEY]).catch(() => undefined);
      await client.end();
    }
    return url.toString();
  })();
  return ready;
}

async function migrateAndSeed(url: string): Promise<void> {
  await migrateDatabase(url);
  const { db, pool } = createDb(url, { max: 1 });
  await seedDemo(db, JSON.parse(fs.readFileSync(DEMO_FILE, 'utf8'))).finally(() => pool.end());
}

export type FreshDemoDatabase = { url: string; drop(): Promise<void> };

/**
 * postgres://…/<test db>_<suffix>, dropped if left over, created, migrated and seeded with the demo: a database for
 * one test file alone (its queue schema too), for tests that run whole processes on it. drop() removes it, closing
 * any connection a killed process left behind.
 */
export async function freshDemoDatabase(suffix: string): Promise<FreshDemoDatabase> {
  const base = new URL(testDatabaseUrl());
  const name = `${base.pathname.slice(1)}_${suffix}`;
  const url = new URL(base);
  url.pathname = `/${name}`;
  const admin = async (sql: string) => {
    const client = new pg.Client({ connectionString: base.toString() });
    await client.connect();
    try {
      await client.query(sql);
    } finally {
      await client.end();
    }
  };
  await admin(`drop database if exists "${name}" with (force)`);
  await admin(`create database "${name}"`);
  await migrateAndSeed(url.toString());
  return { url: url.toString(), drop: () => admin(`drop database if exists "${name}" with (force)`) };
}

/** Server config on the demo database; overrides as environment variables (e.g. JOB_MAINTENANCE_SECONDS). */
export async function demoConfig(overrides: Record<string, string> = {}) {
  return testConfig({ DATABASE_URL: await demoDatabaseUrl(), ...overrides });
}

/** A queued plan row for the window's current version, as the plans API would insert it. */
export async function insertQueuedPlan(db: Db, windowId: string, settings: PlanSettingsInput): Promise<string> {
  const [w] = await db.select({ version: windows.version }).from(windows).where(eq(windows.id, windowId));
  if (!w) throw new Error(`no window ${windowId} in the demo database`);
  const id = `pl-test-${randomUUID().slice(0, 8)}`;
  await db.insert(plans).values({ id, windowId, windowVersion: w.version, settings: planSettingsSchema.parse(settings) });
  return id;
}

export async function readPlan(db: Db, id: string) {
  const [row] = await db.select().from(plans).where(eq(plans.id, id));
  if (!row) throw new Error(`no plan ${id}`);
  return row;
}

/** Polls until `check` returns a value (not undefined) or the time is up. */
export async function waitFor<T>(what: string, check: () => Promise<T | undefined>, timeoutMs = 30_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  for (;;) {
    const value = await check();
    if (value !== undefined) return value;
    if (Date.now() > until) throw new Error(`timed out after ${timeoutMs} ms waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 100));
  }
}
