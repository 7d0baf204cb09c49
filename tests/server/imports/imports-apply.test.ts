// Apply refusals (already applied, data changed since the preview), a failing apply rolled back, and who may import.
import request from 'supertest';
import { importCreatedSchema } from '../../../shared/imports';
import { tenants, users } from '../../../db/schema';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { signInAs } from '../helpers/sign-in';
import { apply, csv, inventoryFingerprint, setupScratchApp, upload, type ImportsContext } from './helpers/scratch-app';

let ctx: ImportsContext;
beforeAll(async () => { ctx = await setupScratchApp({ seedDemo: true }); }, 60_000);
afterAll(() => ctx.dropDatabase());

const siteCsv = (id: string, cpu: number) => csv([['id', 'name', 'kind', 'lat', 'lon', 'cpu'], [id, `Site ${id}`, 'edge', 55.5, -25.5, cpu]]);
const previewOf = async (text: string, name = 'sites.csv') => importCreatedSchema.parse((await upload(ctx, { text, name })).body);
const statusOf = async (id: string) => (await ctx.pool.query('select status, failure_reason from imports where id = $1', [id])).rows[0];

test('applying twice: the second apply is refused with IMPORT_ALREADY_APPLIED', async () => {
  const { id } = await previewOf(siteCsv('twice-1', 8));
  expect((await apply(ctx, id)).status).toBe(200);
  const before = await inventoryFingerprint(ctx.pool);
  const again = await apply(ctx, id);
  expect(again.status).toBe(409);
  expect(again.body.error.code).toBe('IMPORT_ALREADY_APPLIED');
  expect(await inventoryFingerprint(ctx.pool)).toEqual(before);
});

test('a preview made before other data changed is refused as IMPORT_STALE and marked superseded', async () => {
  const first = await previewOf(siteCsv('stale-1', 8));
  const second = await previewOf(siteCsv('stale-2', 8));
  expect((await apply(ctx, first.id)).status).toBe(200);
  const before = await inventoryFingerprint(ctx.pool);
  const res = await apply(ctx, second.id);
  expect(res.status).toBe(409);
  expect(res.body.error.code).toBe('IMPORT_STALE');
  expect(res.body.error.message).toMatch(/changed since this preview/);
  expect(await inventoryFingerprint(ctx.pool)).toEqual(before);
  expect((await statusOf(second.id)).status).toBe('superseded');
});

test('an apply the database refuses rolls back everything and marks the import failed with the reason', async () => {
  // A scenario that adds a site AND removes a tenant; a user account attached to the tenant after the
  // preview makes the tenant delete fail at the very end of the transaction (users are not in the checksum).
  await ctx.db.insert(tenants).values({ id: 't-doomed', name: 'Doomed Ltd', noticeDays: 3 });
  const s = await loadNetworkScenario(ctx.db);
  const target = { ...s, tenants: s.tenants.filter((t) => t.id !== 't-doomed'), sites: [...s.sites, { id: 'fail-site', name: 'Never', kind: 'edge' as const, lat: 55, lon: -25, cpu: 4 }] };
  const preview = await previewOf(JSON.stringify(target), 'target.json');
  expect(preview.preview.errors).toEqual([]);
  expect(preview.preview.removes.tenants).toEqual(['t-doomed']);
  await ctx.db.insert(users).values({ id: `${ctx.prefix}-doomed-user`, email: `doomed.${ctx.prefix}@test.example`, name: 'Late', tenantId: 't-doomed' });
  const before = await inventoryFingerprint(ctx.pool);
  const res = await apply(ctx, preview.id);
  expect(res.status).toBe(422);
  expect(res.body.error.code).toBe('IMPORT_APPLY_FAILED');
  expect(res.body.error.message).toMatch(/nothing was changed/);
  expect(await inventoryFingerprint(ctx.pool)).toEqual(before);
  const row = await statusOf(preview.id);
  expect(row.status).toBe('failed');
  expect(row.failure_reason).toMatch(/refused/);
  const audit = (await ctx.pool.query("select count(*)::int as n from audit_log where action = 'import.apply-failed' and entity_id = $1", [preview.id])).rows[0];
  expect(audit.n).toBe(1);
  expect((await apply(ctx, preview.id)).body.error.code).toBe('IMPORT_FAILED');
});

test('removing a tenant that user accounts belong to is a preview error', async () => {
  const s = await loadNetworkScenario(ctx.db);
  const target = { ...s, tenants: s.tenants.filter((t) => t.id !== 't-doomed') };
  const { preview } = await previewOf(JSON.stringify(target), 'target.json');
  expect(preview.errors).toContainEqual(expect.objectContaining({ path: 'tenants[t-doomed]', message: expect.stringMatching(/1 user account/) }));
});

test('an unknown import id is 404 on detail and apply', async () => {
  expect((await request(ctx.app).get('/api/imports/imp-nope').set('Cookie', ctx.planner)).body.error.code).toBe('IMPORT_NOT_FOUND');
  const res = await apply(ctx, 'imp-nope');
  expect(res.status).toBe(404);
  expect(res.body.error.code).toBe('IMPORT_NOT_FOUND');
});

test('only admins and planners may import: others get 403, no session 401, and nothing is written', async () => {
  const before = await inventoryFingerprint(ctx.pool);
  const { id } = await previewOf(siteCsv('role-1', 8));
  for (const who of ['engineer', 'approver', 'tenant', 'noRoles'] as const) {
    const cookie = await signInAs(ctx.app, ctx.users[who].email);
    expect((await upload(ctx, { text: siteCsv('role-2', 8), name: 'sites.csv' }, cookie)).status).toBe(403);
    expect((await apply(ctx, id, cookie)).status).toBe(403);
    expect((await request(ctx.app).get('/api/imports').set('Cookie', cookie)).status).toBe(403);
    expect((await request(ctx.app).get(`/api/imports/${id}`).set('Cookie', cookie)).status).toBe(403);
    expect((await request(ctx.app).get('/api/imports/templates/csv-sites').set('Cookie', cookie)).status).toBe(403);
  }
  expect((await request(ctx.app).post('/api/imports').attach('file', Buffer.from(siteCsv('role-3', 8)), 'sites.csv')).status).toBe(401);
  expect((await request(ctx.app).post(`/api/imports/${id}/apply`)).status).toBe(401);
  expect(await inventoryFingerprint(ctx.pool)).toEqual(before);
  // The admin may do everything the planner may.
  expect((await apply(ctx, id, ctx.admin)).status).toBe(200);
});
