// The documented backup: `npm run backup` dumps a seeded database, `npm run restore` loads it into an empty one
// and refuses a database that is not empty, and the app runs on the restored copy with the same data.
import { execFile } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import request from 'supertest';
import { createDb, type Db } from '../../../db/client';
import { countSeededRows } from '../../../db/queries/count-seeded-rows';
import { DEMO_PASSWORD } from '../../../db/seed/demo-users';
import { createApp } from '../../../server/app';
import { sessionCookieFrom, testConfig, testDatabaseUrl } from '../helpers/test-app';

const ROOT = path.join(__dirname, '../../..');
type Run = { code: number; stdout: string; stderr: string };

/** Runs a command from the repository root with DATABASE_URL set; never throws on a non-zero exit. */
function run(command: string, args: string[], databaseUrl: string): Promise<Run> {
  return new Promise((resolve) => {
    execFile(command, args, { cwd: ROOT, env: { ...process.env, DATABASE_URL: databaseUrl }, maxBuffer: 16 << 20 },
      (err, stdout, stderr) => resolve({ code: err ? Number((err as { code?: unknown }).code ?? 1) : 0, stdout, stderr }));
  });
}

/** A URL for `<test database>_<suffix>`, dropped and created afresh (empty). */
async function freshDatabase(suffix: string): Promise<string> {
  const url = new URL(testDatabaseUrl());
  const name = `${url.pathname.slice(1)}_${suffix}`;
  const admin = new pg.Client({ connectionString: testDatabaseUrl() });
  await admin.connect();
  try {
    await admin.query(`drop database if exists "${name}" with (force)`);
    await admin.query(`create database "${name}"`);
  } finally {
    await admin.end();
  }
  url.pathname = `/${name}`;
  return url.toString();
}

async function dropDatabase(url: string): Promise<void> {
  const admin = new pg.Client({ connectionString: testDatabaseUrl() });
  await admin.connect();
  try {
    await admin.query(`drop database if exists "${new URL(url).pathname.slice(1)}" with (force)`);
  } finally {
    await admin.end();
  }
}

let sourceUrl: string;
let targetUrl: string;
let dir: string;
const pools: pg.Pool[] = [];
function open(url: string): Db {
  const { db, pool } = createDb(url, { max: 2 });
  pools.push(pool);
  return db;
}

beforeAll(async () => {
  sourceUrl = await freshDatabase('backup_source');
  targetUrl = await freshDatabase('backup_target');
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'slackwater-backup-'));
  // The documented set-up: migrations and the demo seed.
  const setup = await run(path.join(ROOT, 'node_modules/.bin/tsx'), ['db/setup.ts'], sourceUrl);
  if (setup.code !== 0) throw new Error(`db/setup.ts failed: ${setup.stderr}`);
}, 120_000);

afterAll(async () => {
  for (const pool of pools) await pool.end();
  await dropDatabase(sourceUrl);
  await dropDatabase(targetUrl);
  fs.rmSync(dir, { recursive: true, force: true });
});

/** Signs the demo planner in on an app over `url` and reads what the planner's screens count. */
async function plannerView(url: string): Promise<{ sites: number; slices: number; tenants: number }> {
  const app = createApp({ db: open(url), config: testConfig({ DATABASE_URL: url }) });
  const signIn = await request(app).post('/api/auth/sign-in').send({ email: 'planner@demo.test', password: DEMO_PASSWORD });
  expect(signIn.status).toBe(200);
  const cookie = sessionCookieFrom(signIn);
  const read = async (p: string) => {
    const res = await request(app).get(p).set('Cookie', cookie);
    expect([p, res.status]).toEqual([p, 200]);
    return res.body as unknown;
  };
  const length = (body: unknown) => (Array.isArray(body) ? body.length : (body as { items: unknown[] }).items.length);
  return { sites: length(await read('/api/sites')), slices: length(await read('/api/slices')), tenants: length(await read('/api/tenants')) };
}

test('a backup restores into an empty database, which the app then runs on with the same data', async () => {
  const file = path.join(dir, 'slackwater.dump');
  const backup = await run('npm', ['run', '-s', 'backup', '--', file], sourceUrl);
  expect([backup.code, backup.stderr]).toEqual([0, expect.stringContaining(`wrote ${file}`)]);
  // pg_dump's custom format starts with its magic bytes.
  expect(fs.readFileSync(file).subarray(0, 5).toString('latin1')).toBe('PGDMP');
  expect(fs.statSync(file).mode & 0o077).toBe(0);

  const restore = await run('npm', ['run', '-s', 'restore', '--', file], targetUrl);
  expect([restore.code, restore.stderr]).toEqual([0, expect.stringContaining('restored')]);

  const sourceCounts = await countSeededRows(open(sourceUrl));
  expect(sourceCounts.sites).toBeGreaterThan(0);
  expect(sourceCounts.users).toBeGreaterThan(0);
  expect(await countSeededRows(open(targetUrl))).toEqual(sourceCounts);

  const restoredView = await plannerView(targetUrl);
  expect(restoredView.sites).toBe(sourceCounts.sites);
  expect(restoredView).toEqual(await plannerView(sourceUrl));
});

test('restore refuses a database that is not empty and leaves it as it was', async () => {
  const file = path.join(dir, 'again.dump');
  expect((await run('npm', ['run', '-s', 'backup', '--', file], sourceUrl)).code).toBe(0);
  const before = await countSeededRows(open(sourceUrl));
  const refused = await run('npm', ['run', '-s', 'restore', '--', file], sourceUrl);
  expect(refused.code).not.toBe(0);
  expect(refused.stderr).toContain('is not empty');
  expect(await countSeededRows(open(sourceUrl))).toEqual(before);
});

test('backup will not overwrite a file, and restore refuses a file that is not an archive', async () => {
  const existing = path.join(dir, 'existing.dump');
  fs.writeFileSync(existing, 'keep me');
  const overwrite = await run('npm', ['run', '-s', 'backup', '--', existing], sourceUrl);
  expect([overwrite.code === 0, fs.readFileSync(existing, 'utf8')]).toEqual([false, 'keep me']);
  const empty = await freshDatabase('backup_empty');
  try {
    const junk = await run('npm', ['run', '-s', 'restore', '--', existing], empty);
    expect([junk.code === 0, junk.stderr]).toEqual([false, expect.stringContaining('is not a pg_dump archive')]);
  } finally {
    await dropDatabase(empty);
  }
});
