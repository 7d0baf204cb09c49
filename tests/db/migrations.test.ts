// The committed migrations build the schema the Drizzle definitions describe, with its key constraints.
import fs from 'node:fs';
import path from 'node:path';
import { getTableName, is } from 'drizzle-orm';
import { PgTable } from 'drizzle-orm/pg-core';
import * as schema from '../../db/schema';
import { MIGRATIONS_FOLDER, migrateDatabase } from '../../db/migrate';
import { createScratchDb, type TestDb } from './helpers';

let t: TestDb;

beforeAll(async () => {
  t = await createScratchDb('db_migrations');
}, 60_000);

afterAll(async () => {
  await t?.close();
});

const journal = JSON.parse(fs.readFileSync(path.join(MIGRATIONS_FOLDER, 'meta', '_journal.json'), 'utf8')) as {
  entries: { tag: string }[];
};

test('every committed migration is recorded as applied, and re-applying changes nothing', async () => {
  const count = async () => (await t.pool.query('select count(*)::int as n from drizzle.__drizzle_migrations')).rows[0].n;
  expect(await count()).toBe(journal.entries.length);
  await migrateDatabase(t.url);
  expect(await count()).toBe(journal.entries.length);
});

test('every table of the Drizzle schema exists after migrating', async () => {
  const expected = Object.values(schema).filter((v) => is(v, PgTable)).map((v) => getTableName(v as PgTable)).sort();
  const { rows } = await t.pool.query<{ table_name: string }>(
    "select table_name from information_schema.tables where table_schema = 'public' order by table_name",
  );
  expect(expected.length).toBeGreaterThanOrEqual(15);
  expect(rows.map((r) => r.table_name)).toEqual(expect.arrayContaining(expected));
});

test('a new window starts at version 1', async () => {
  await t.pool.query(
    "insert into windows (id, title, starts_at, ends_at) values ('w-v', 'Version check', now(), now() + interval '1 hour')",
  );
  const { rows } = await t.pool.query("select version, status from windows where id = 'w-v'");
  expect(rows[0]).toEqual({ version: 1, status: 'draft' });
});

test('a slice can have many placement revisions but only one current', async () => {
  await t.pool.query("insert into tenants (id, name, notice_days) values ('t-x', 'Tenant X', 3)");
  await t.pool.query("insert into slices (id, tenant_id, name, sst, priority) values ('sl-x', 't-x', 'Slice X', 1, 2)");
  const insert = (revision: number, current: boolean) => t.pool.query(
    "insert into placements (slice_id, revision, current, sites, paths) values ('sl-x', $1, $2, '{}', '{}')",
    [revision, current],
  );
  await insert(1, false);
  await insert(2, true);
  await expect(insert(3, true)).rejects.toThrow(/placements_one_current_key/);
  await expect(insert(2, false)).rejects.toThrow(/placements_slice_id_revision_pk/);
  const { rows } = await t.pool.query("select revision from placements where slice_id = 'sl-x' and current");
  expect(rows).toEqual([{ revision: 2 }]);
});
