// The shipped demo scenario seeds completely, and the demo's calendar starts just ahead of the seeding day.
import fs from 'node:fs';
import path from 'node:path';
import { DEMO_USERS, seedDemo } from '../../db/seed';
import { countSeededRows } from '../../db/queries/count-seeded-rows';
import type { Scenario } from '../../shared/scenario';
import { createScratchDb, type TestDb } from './helpers';

const DAY_MS = 86_400_000;
const demo = JSON.parse(fs.readFileSync(path.resolve(__dirname, '../../scenarios/demo.json'), 'utf8')) as Scenario;
let t: TestDb;

beforeAll(async () => {
  t = await createScratchDb('db_demo_file');
}, 60_000);

afterAll(async () => {
  await t?.close();
});

test('the demo file seeds every site, span, tenant, slice, placement and window, twice without duplicates', async () => {
  const now = new Date('2032-02-14T09:30:00Z');
  await seedDemo(t.db, demo, { now });
  const first = await countSeededRows(t.db);
  expect(first).toMatchObject({
    sites: demo.sites.length,
    spans: demo.spans.length,
    tenants: demo.tenants.length,
    slices: demo.slices.length,
    functions: demo.slices.reduce((n, s) => n + s.functions.length, 0),
    ties: demo.slices.reduce((n, s) => n + s.ties.length, 0),
    placements: demo.placements.length,
    windows: (demo.windows ?? []).length,
    users: DEMO_USERS.length,
  });
  await seedDemo(t.db, demo, { now });
  expect(await countSeededRows(t.db)).toEqual(first);

  const { rows } = await t.pool.query('select min(starts_at) as first from windows');
  const dayStartMs = Date.UTC(2032, 1, 14);
  expect(rows[0].first.getTime()).toBeGreaterThanOrEqual(dayStartMs + DAY_MS);
  expect(rows[0].first.getTime()).toBeLessThan(dayStartMs + 8 * DAY_MS);
});

test('the demo tenant account belongs to a tenant without critical slices', async () => {
  const { rows } = await t.pool.query(
    "select u.tenant_id, bool_or(s.critical) as critical from users u join slices s on s.tenant_id = u.tenant_id where u.email = 'tenant@demo.test' group by u.tenant_id",
  );
  expect(rows).toHaveLength(1);
  expect(rows[0].critical).toBe(false);
});
