// Seeding the demo: complete, idempotent, all-or-nothing, with working argon2id demo accounts.
import { verify } from '@node-rs/argon2';
import { seedDemo, ScenarioInvalidError, DEMO_USERS, DEMO_PASSWORD } from '../../db/seed';
import { countSeededRows } from '../../db/queries/count-seeded-rows';
import { smallScenario } from './fixtures/small-scenario';
import { createScratchDb, type TestDb } from './helpers';

let t: TestDb;
const NOW = new Date('2031-05-10T15:00:00Z');
const DAY_MS = 86_400_000;

beforeAll(async () => {
  t = await createScratchDb('db_seed');
}, 60_000);

afterAll(async () => {
  await t?.close();
});

beforeEach(async () => {
  await t.pool.query('truncate tenants, sites, spans, slices, slice_functions, slice_ties, placements, windows, window_elements, users, password_credentials, role_grants, sessions cascade');
});

const zeroCounts = async () => Object.fromEntries(Object.keys(await countSeededRows(t.db)).map((k) => [k, 0]));

test('seeding writes every element of the scenario and one account per role', async () => {
  const s = smallScenario();
  await seedDemo(t.db, s, { now: NOW });
  const counts = await countSeededRows(t.db);
  expect(counts).toMatchObject({
    tenants: s.tenants.length,
    sites: s.sites.length,
    spans: s.spans.length,
    slices: s.slices.length,
    functions: s.slices.reduce((n, x) => n + x.functions.length, 0),
    ties: s.slices.reduce((n, x) => n + x.ties.length, 0),
    placements: s.placements.length,
    windows: s.windows!.length,
    windowElements: 3,
    users: DEMO_USERS.length,
    passwordCredentials: DEMO_USERS.length,
    roleGrants: DEMO_USERS.length,
  });
});

test('seeding twice leaves identical counts and reports nothing new the second time', async () => {
  const first = await seedDemo(t.db, smallScenario(), { now: NOW });
  const after1 = await countSeededRows(t.db);
  // A later day must not move or duplicate windows already seeded.
  const second = await seedDemo(t.db, smallScenario(), { now: new Date(NOW.getTime() + 9 * DAY_MS) });
  expect(await countSeededRows(t.db)).toEqual(after1);
  expect(Object.values(first).some((n) => n > 0)).toBe(true);
  expect(Object.values(second).every((n) => n === 0)).toBe(true);
});

test('every slice has exactly one current placement, at revision 1', async () => {
  await seedDemo(t.db, smallScenario(), { now: NOW });
  const { rows } = await t.pool.query(
    'select s.id, count(p.*) filter (where p.current)::int as current, max(p.revision) as revision from slices s left join placements p on p.slice_id = s.id group by s.id',
  );
  expect(rows).toHaveLength(smallScenario().slices.length);
  for (const r of rows) expect(r).toMatchObject({ current: 1, revision: 1 });
  const grid = await t.pool.query("select sites, paths from placements where slice_id = 'sl-grid'");
  expect(grid.rows[0].paths).toEqual({ 'tie-grid': ['sp-2', 'sp-1'] });
});

test('past windows are moved by whole weeks to start 1–8 days after the seeding day, at version 1', async () => {
  await seedDemo(t.db, smallScenario(), { now: NOW });
  const { rows } = await t.pool.query('select id, starts_at, ends_at, version, owner_id from windows order by starts_at');
  const source = new Map(smallScenario().windows!.map((w) => [w.id, w]));
  const dayStartMs = Date.UTC(2031, 4, 10);
  expect(rows[0].starts_at.getTime()).toBeGreaterThanOrEqual(dayStartMs + DAY_MS);
  expect(rows[0].starts_at.getTime()).toBeLessThan(dayStartMs + 8 * DAY_MS);
  for (const r of rows) {
    const w = source.get(r.id)!;
    const shiftMs = r.starts_at.getTime() - Date.parse(w.start);
    expect(shiftMs % (7 * DAY_MS)).toBe(0);
    expect(r.ends_at.getTime() - r.starts_at.getTime()).toBe(Date.parse(w.end) - Date.parse(w.start));
    expect(r.version).toBe(1);
    expect(r.owner_id).toBe('user-demo-engineer');
  }
});

test('demo accounts hold argon2id hashes of the demo password; the tenant account belongs to a non-critical tenant', async () => {
  await seedDemo(t.db, smallScenario(), { now: NOW });
  const { rows } = await t.pool.query(
    'select u.email, u.tenant_id, c.password_hash, array_agg(g.role) as roles from users u join password_credentials c on c.user_id = u.id join role_grants g on g.user_id = u.id group by u.email, u.tenant_id, c.password_hash',
  );
  expect(rows.map((r) => r.email).sort()).toEqual(DEMO_USERS.map((u) => u.email).sort());
  for (const r of rows) {
    expect(r.password_hash.startsWith('$argon2id$')).toBe(true);
    expect(await verify(r.password_hash, DEMO_PASSWORD)).toBe(true);
    expect(await verify(r.password_hash, 'wrong-password')).toBe(false);
    expect(r.roles).toEqual([DEMO_USERS.find((u) => u.email === r.email)!.role]);
    expect(r.tenant_id).toBe(r.email === 'tenant@demo.test' ? 't-fab' : null);
  }
});

test('an invalid scenario is refused with its errors and writes nothing', async () => {
  const bad = smallScenario();
  bad.placements[0].paths['tie-grid'] = ['sp-4']; // does not join s-edge1 to s-core
  bad.slices[1].tenant = 't-missing';
  const error = await seedDemo(t.db, bad, { now: NOW }).catch((e: unknown) => e);
  expect(error).toBeInstanceOf(ScenarioInvalidError);
  const paths = (error as ScenarioInvalidError).errors.map((e) => e.path);
  expect(paths).toEqual(expect.arrayContaining(['$.slices[1].tenant']));
  expect(paths.some((p) => p.startsWith('$.placements[0]'))).toBe(true);
  expect(await countSeededRows(t.db)).toEqual(await zeroCounts());
});

test('a failure late in the transaction rolls back everything written before it', async () => {
  // Windows are inserted last; a trigger on this file's scratch database makes that insert fail, so every earlier
  // insert of the transaction has already been written when the failure comes.
  await t.pool.query(`create or replace function fail_window_insert() returns trigger language plpgsql as $$
    begin raise exception 'window insert refused for the test'; end $$`);
  await t.pool.query('create trigger fail_window_insert before insert on windows for each row execute function fail_window_insert()');
  try {
    await expect(seedDemo(t.db, smallScenario(), { now: NOW })).rejects.toThrow(/insert into "windows"/);
    expect(await countSeededRows(t.db)).toEqual(await zeroCounts());
  } finally {
    await t.pool.query('drop trigger fail_window_insert on windows');
  }
});
