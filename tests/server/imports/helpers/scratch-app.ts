// A scratch database per test file (imports rewrite the inventory), optionally seeded with the demo scenario.
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import request from 'supertest';
import { seedDemo } from '../../../../db/seed';
import { uploadChecks } from '../../../../server/imports/check-thread';
import demo from '../../../../scenarios/demo.json';
import { signInAs } from '../../helpers/sign-in';
import { setupTestApp, testDatabaseUrl, type TestContext } from '../../helpers/test-app';

export type ImportsContext = TestContext & { admin: string; planner: string; dropDatabase: () => Promise<void> };

export async function setupScratchApp(options: { seedDemo: boolean }): Promise<ImportsContext> {
  const baseUrl = testDatabaseUrl();
  const name = `slackwater_imports_${randomUUID().slice(0, 8)}`;
  const maint = new pg.Client({ connectionString: baseUrl });
  await maint.connect();
  await maint.query(`create database ${name}`);
  await maint.end();
  const url = new URL(baseUrl);
  url.pathname = `/${name}`;
  process.env.TEST_DATABASE_URL = url.toString();
  const ctx = await setupTestApp();
  process.env.TEST_DATABASE_URL = baseUrl;
  if (options.seedDemo) await seedDemo(ctx.db, demo);
  const dropDatabase = async () => {
    await ctx.close();
    // Upload check threads are per process; none may outlive the file's tests.
    await uploadChecks.close();
    const client = new pg.Client({ connectionString: baseUrl });
    await client.connect();
    await client.query(`drop database if exists ${name} with (force)`);
    await client.end();
  };
  return {
    ...ctx, dropDatabase,
    admin: await signInAs(ctx.app, ctx.users.admin.email),
    planner: await signInAs(ctx.app, ctx.users.planner.email),
  };
}

const INVENTORY_TABLES = ['tenants', 'sites', 'spans', 'slices', 'slice_functions', 'slice_ties', 'placements', 'network_meta'];

/** Row count and md5 of the ordered rows of every inventory table: equal before and after ⇔ nothing written. */
export async function inventoryFingerprint(pool: pg.Pool): Promise<Record<string, string>> {
  const out: Record<string, string> = {};
  for (const table of INVENTORY_TABLES) {
    const { rows } = await pool.query(`select count(*)::int as n, md5(coalesce(string_agg(t::text, '|' order by t::text), '')) as sum from ${table} t`);
    out[table] = `${rows[0].n}:${rows[0].sum}`;
  }
  return out;
}

export async function importRowCount(pool: pg.Pool): Promise<number> {
  const { rows } = await pool.query('select count(*)::int as n from imports');
  return rows[0].n;
}

/** `defaults` and `mapping` go as text fields, JSON-encoded unless already a string (to send broken JSON). */
export function upload(
  ctx: ImportsContext, file: { text: string | Buffer; name: string; kind?: string; defaults?: unknown; mapping?: unknown }, cookie = ctx.planner,
) {
  const req = request(ctx.app).post('/api/imports').set('Cookie', cookie);
  if (file.kind) req.field('kind', file.kind);
  const asText = (v: unknown) => (typeof v === 'string' ? v : JSON.stringify(v));
  if (file.defaults !== undefined) req.field('defaults', asText(file.defaults));
  if (file.mapping !== undefined) req.field('mapping', asText(file.mapping));
  const bytes = typeof file.text === 'string' ? Buffer.from(file.text, 'utf8') : file.text;
  return req.attach('file', bytes, { filename: file.name, contentType: 'application/octet-stream' });
}

export function apply(ctx: ImportsContext, id: string, cookie = ctx.planner) {
  return request(ctx.app).post(`/api/imports/${id}/apply`).set('Cookie', cookie);
}

/** Rows → CSV text (cells containing commas or quotes are quoted). */
export function csv(rows: (string | number | boolean | undefined)[][]): string {
  const cell = (v: string | number | boolean | undefined) => {
    const s = v === undefined ? '' : String(v);
    return /[",\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
  };
  return rows.map((r) => r.map(cell).join(',')).join('\n') + '\n';
}
