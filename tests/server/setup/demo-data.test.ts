// Removing the demo from a running instance: admins only, counts first, an explicit confirmation, one transaction
// that takes the demo's rows and what depends on them, keeps everything else and the caller's own account.
import request from 'supertest';
import { DEMO_PASSWORD, seedDemo } from '../../../db/seed';
import { readDemoFile } from '../../../db/seed/demo-identity';
import { sites, spans, tenants, signoffs, slices, placements, windows, windowElements } from '../../../db/schema';
import { createApp } from '../../../server/app';
import { DEMO_REMOVAL_CONFIRMATION, demoDataSummarySchema, demoRemovalResultSchema } from '../../../shared/demo-data';
import { createScratchDb, type TestDb } from '../../db/helpers';
import { insertTestUsers, sessionCookieFrom, testConfig, type TestUsers } from '../helpers/test-app';
import { signInAs } from '../helpers/sign-in';

type DemoFile = { sites: { id: string }[]; spans: { id: string }[]; tenants: { id: string }[]; slices: { id: string }[]; windows: { id: string }[] };

let t: TestDb;
let app: ReturnType<typeof createApp>;
let staff: TestUsers;
let demoAdminCookie: string;
const demo = readDemoFile() as DemoFile;
const NOW = new Date('2031-06-01T08:00:00Z');
const CONFIRM = { confirm: DEMO_REMOVAL_CONFIRMATION };

/** Rows not from the demo: a site of our own linked to a demo site (that span must go) and to another of ours
 *  (stays), our own tenant's slice on our own site (stays), and one window on a demo site (goes) and one on ours. */
async function addOwnRows() {
  const demoSite = demo.sites[0].id;
  await t.db.insert(sites).values([
    { id: 'own-x', name: 'Own X', kind: 'edge', lat: 1, lon: 1, cpu: 8 },
    { id: 'own-y', name: 'Own Y', kind: 'edge', lat: 1.1, lon: 1, cpu: 8 },
  ]);
  await t.db.insert(spans).values([
    { id: 'own-xy', siteA: 'own-x', siteB: 'own-y', capacityGbps: 10, lengthKm: 5 },
    { id: 'own-x-demo', siteA: 'own-x', siteB: demoSite, capacityGbps: 10, lengthKm: 5 },
  ]);
  await t.db.insert(tenants).values({ id: 'own-tenant', name: 'Own tenant', noticeDays: 5 });
  await t.db.insert(slices).values({ id: 'own-slice', tenantId: 'own-tenant', name: 'Own slice', sst: 1, priority: 2 });
  await t.db.insert(placements).values({ sliceId: 'own-slice', revision: 1, sites: {}, paths: { tie: ['own-xy'] } });
  const at = { startsAt: new Date('2031-07-01T01:00:00Z'), endsAt: new Date('2031-07-01T03:00:00Z') };
  await t.db.insert(windows).values([{ id: 'own-w-demo', title: 'On a demo site', ...at }, { id: 'own-w-own', title: 'On our site', ...at }]);
  await t.db.insert(windowElements).values([
    { windowId: 'own-w-demo', elementKind: 'site', elementId: demoSite, effect: 'down' },
    { windowId: 'own-w-own', elementKind: 'site', elementId: 'own-x', effect: 'down' },
  ]);
  // A demo approver's decision on our window: it would block deleting that account (approver_id is RESTRICT).
  await t.db.insert(signoffs).values({ windowId: 'own-w-own', round: 1, planId: 'plan-own', approverId: 'user-demo-approver', decision: 'approve' });
}

async function ids(table: string): Promise<string[]> {
  return (await t.pool.query(`select id from ${table} order by id`)).rows.map((r) => r.id as string);
}

beforeAll(async () => {
  t = await createScratchDb('setup_demo_data');
  await seedDemo(t.db, demo, { now: NOW });
  staff = (await insertTestUsers(t.db, 'dd')).users;
  await addOwnRows();
  app = createApp({ db: t.db, config: testConfig({ DATABASE_URL: t.url }), now: () => NOW, signInLimit: { windowMs: 60_000, perAccount: 1000, perAddress: 1000 } });
  const res = await request(app).post('/api/auth/sign-in').send({ email: 'admin@demo.test', password: DEMO_PASSWORD });
  demoAdminCookie = sessionCookieFrom(res);
}, 120_000);
afterAll(() => t?.close());

test('roles: tenants do not see the route, other staff are refused, signed-out callers must sign in', async () => {
  expect((await request(app).get('/api/demo-data')).status).toBe(401);
  for (const who of ['planner', 'engineer', 'approver'] as const) {
    const cookie = await signInAs(app, staff[who].email);
    expect((await request(app).get('/api/demo-data').set('Cookie', cookie)).status).toBe(403);
    expect((await request(app).delete('/api/demo-data').set('Cookie', cookie).send(CONFIRM)).status).toBe(403);
  }
  const tenant = await signInAs(app, staff.tenant.email);
  expect((await request(app).delete('/api/demo-data').set('Cookie', tenant).send(CONFIRM)).status).toBe(404);
  expect(await ids('sites')).toContain(demo.sites[0].id);
});

test('the summary counts the demo and what depends on it, and names the caller\'s own demo account as kept', async () => {
  const res = await request(app).get('/api/demo-data').set('Cookie', demoAdminCookie);
  expect(res.status).toBe(200);
  const summary = demoDataSummarySchema.parse(res.body);
  expect(summary.present).toBe(true);
  expect(summary.counts).toMatchObject({
    sites: demo.sites.length,
    spans: demo.spans.length + 1, // with the span from our own site to a demo site
    tenants: demo.tenants.length,
    slices: demo.slices.length,
    placements: demo.slices.length,
    windows: demo.windows.length + 1, // with our window on a demo site
    signoffs: 1,
    accounts: 5, // six demo accounts less the caller's
    networkOutline: 1,
    demoSignOn: 1, // single sign-on as seeded, pointing at the local test issuer
  });
  expect(summary.keptAccount).toEqual({ name: 'Robin Hale', email: 'admin@demo.test' });
  expect(summary.accountNames).not.toContain('Robin Hale');
});

test('without the confirmation words nothing is removed', async () => {
  const res = await request(app).delete('/api/demo-data').set('Cookie', demoAdminCookie).send({ confirm: 'yes' });
  expect(res.status).toBe(400);
  expect(await ids('tenants')).toEqual(expect.arrayContaining(demo.tenants.map((x) => x.id)));
});

test('a failure part way leaves every row as it was', async () => {
  const before = await Promise.all(['sites', 'spans', 'tenants', 'slices', 'windows', 'users'].map(ids));
  // Tenants are deleted late, after windows, accounts and slices: a refusal there proves those deletes roll back.
  await t.pool.query(`create function refuse_delete() returns trigger language plpgsql as $$ begin raise exception 'refused by test'; end $$;
    create trigger refuse_tenant_delete before delete on tenants for each row execute function refuse_delete();`);
  try {
    const res = await request(createApp({ db: t.db, config: testConfig({ DATABASE_URL: t.url }), now: () => NOW, log: () => undefined }))
      .delete('/api/demo-data').set('Cookie', demoAdminCookie).send(CONFIRM);
    expect(res.status).toBe(500);
  } finally {
    await t.pool.query('drop trigger refuse_tenant_delete on tenants; drop function refuse_delete();');
  }
  expect(await Promise.all(['sites', 'spans', 'tenants', 'slices', 'windows', 'users'].map(ids))).toEqual(before);
});

test('removal takes the demo and its dependants in one go, keeps our rows and the caller, then answers 409', async () => {
  const res = await request(app).delete('/api/demo-data').set('Cookie', demoAdminCookie).send(CONFIRM);
  expect(res.status).toBe(200);
  const result = demoRemovalResultSchema.parse(res.body);
  expect(result.removed).toMatchObject({ sites: demo.sites.length, tenants: demo.tenants.length, accounts: 5 });
  expect(result.keptAccount?.email).toBe('admin@demo.test');

  expect(await ids('sites')).toEqual(['own-x', 'own-y']);
  expect(await ids('spans')).toEqual(['own-xy']);
  expect(await ids('tenants')).toEqual(['dd-tenant', 'own-tenant']);
  expect(await ids('slices')).toEqual(['own-slice']);
  expect(await ids('windows')).toEqual(['own-w-own']);
  expect((await t.pool.query('select count(*)::int as n from signoffs')).rows[0].n).toBe(0);
  expect((await t.pool.query('select count(*)::int as n from network_meta')).rows[0].n).toBe(0);
  expect((await t.pool.query('select count(*)::int as n from sso_settings')).rows[0].n).toBe(0);
  const emails = (await t.pool.query('select email from users order by email')).rows.map((r) => r.email as string);
  expect(emails.filter((e) => e.endsWith('@demo.test'))).toEqual(['admin@demo.test']);
  expect(emails).toEqual(expect.arrayContaining(Object.values(staff).map((u) => u.email)));
  const audit = await t.pool.query("select after from audit_log where action = 'demo-data.remove'");
  expect(audit.rows).toHaveLength(1);

  // The caller is still signed in and sees nothing left to remove.
  const after = await request(app).get('/api/demo-data').set('Cookie', demoAdminCookie);
  expect(demoDataSummarySchema.parse(after.body).present).toBe(false);
  const again = await request(app).delete('/api/demo-data').set('Cookie', demoAdminCookie).send(CONFIRM);
  expect([again.status, again.body.error.code]).toEqual([409, 'DEMO_DATA_ABSENT']);
});
