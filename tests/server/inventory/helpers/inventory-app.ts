// Each inventory test file gets its own scratch database with the demo scenario seeded, so totals are exact.
import fs from 'node:fs';
import path from 'node:path';
import pg from 'pg';
import { eq } from 'drizzle-orm';
import { users } from '../../../../db/schema';
import { pickDemoTenantId, seedDemo } from '../../../../db/seed';
import type { Scenario } from '../../../../shared/scenario';
import { setupTestApp, type TestContext } from '../../helpers/test-app';

export const DEMO_FILE = path.resolve(__dirname, '../../../../scenarios/demo.json');

export function readDemo(): Scenario {
  return JSON.parse(fs.readFileSync(DEMO_FILE, 'utf8')) as Scenario;
}

export function withDatabase(url: string, name: string): string {
  const u = new URL(url);
  u.pathname = `/${name}`;
  return u.toString();
}

/** Runs statements on the cluster's `postgres` database (create/drop scratch databases). */
export async function admin(baseUrl: string, statements: string[]): Promise<void> {
  const client = new pg.Client({ connectionString: withDatabase(baseUrl, 'postgres') });
  await client.connect();
  try {
    for (const s of statements) await client.query(s);
  } finally {
    await client.end();
  }
}

export type InventoryContext = TestContext & {
  demo: Scenario;
  /** the demo tenant the test file's tenant user now belongs to */
  demoTenantId: string;
  databaseUrl: string;
};

/** Fresh database `slackwater_inv_<name>` (name: lowercase letters, digits, _), migrated and seeded with the demo. */
export async function setupInventoryApp(name: string): Promise<InventoryContext> {
  const base = process.env.TEST_DATABASE_URL;
  if (!base) throw new Error('TEST_DATABASE_URL is not set');
  if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`bad scratch database name ${name}`);
  const dbName = `slackwater_inv_${name}`;
  await admin(base, [`drop database if exists "${dbName}" with (force)`, `create database "${dbName}"`]);
  const databaseUrl = withDatabase(base, dbName);
  // Jest gives each test file its own copy of process.env, so this does not leak into other files.
  process.env.TEST_DATABASE_URL = databaseUrl;
  const ctx = await setupTestApp();
  const demo = readDemo();
  await seedDemo(ctx.db, demo, { now: new Date('2031-03-01T08:00:00Z') });
  const demoTenantId = pickDemoTenantId(demo)!;
  await ctx.db.update(users).set({ tenantId: demoTenantId }).where(eq(users.id, ctx.users.tenant.id));
  const close = async () => {
    await ctx.close();
    await admin(base, [`drop database if exists "${dbName}" with (force)`]);
  };
  return { ...ctx, demo, demoTenantId, databaseUrl, close };
}
