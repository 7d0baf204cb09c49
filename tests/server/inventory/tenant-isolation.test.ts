// A tenant user sees its own slices and the sites/spans they use, never another tenant's names or figures.
import request from 'supertest';
import {
  networkMapSchema, siteDetailSchema, siteListSchema, sliceListSchema, spanDetailSchema, spanListSchema, tenantListSchema,
} from '../../../shared/inventory';
import { signInAs } from '../helpers/sign-in';
import { expectedSiteCpu, expectedSpanGbps, footprintOf } from './helpers/demo-expectations';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;
let cookie: string;
let own: Set<string>;
let seen: { sites: Set<string>; spans: Set<string> };
/** Names and ids that must never reach this tenant user. */
let foreign: string[];

beforeAll(async () => {
  ctx = await setupInventoryApp('isolation');
  cookie = await signInAs(ctx.app, ctx.users.tenant.email);
  own = new Set(ctx.demo.slices.filter((s) => s.tenant === ctx.demoTenantId).map((s) => s.id));
  seen = footprintOf(ctx.demo, own);
  const others = ctx.demo.slices.filter((s) => !own.has(s.id));
  foreign = [
    ...ctx.demo.tenants.filter((t) => t.id !== ctx.demoTenantId).flatMap((t) => [t.id, t.name]),
    ...others.flatMap((s) => [s.id, s.name]),
  ];
}, 60_000);
afterAll(() => ctx.close());

const get = (url: string) => request(ctx.app).get(url).set('Cookie', cookie);
const leaks = (body: unknown) => foreign.filter((x) => JSON.stringify(body).includes(x));

test('the fixture is meaningful: the tenant owns some slices and others exist', () => {
  expect(own.size).toBeGreaterThan(0);
  expect(own.size).toBeLessThan(ctx.demo.slices.length);
  expect(seen.sites.size).toBeLessThan(ctx.demo.sites.length);
});

test('slices list: only its own, even when asked for another tenant', async () => {
  const body = sliceListSchema.parse((await get('/api/slices?pageSize=200')).body);
  expect(new Set(body.items.map((s) => s.id))).toEqual(own);
  expect(leaks(body)).toEqual([]);
  const other = ctx.demo.tenants.find((t) => t.id !== ctx.demoTenantId)!;
  expect(sliceListSchema.parse((await get(`/api/slices?tenant=${other.id}`)).body).total).toBe(0);
});

test('sites and spans lists: only its footprint, with its own load only', async () => {
  const sites = siteListSchema.parse((await get('/api/sites?pageSize=200')).body);
  expect(new Set(sites.items.map((s) => s.id))).toEqual(seen.sites);
  const ownCpu = expectedSiteCpu(ctx.demo, own);
  for (const s of sites.items) expect(s.cpuUsed).toBeCloseTo(ownCpu.get(s.id) ?? 0, 9);
  expect(leaks(sites)).toEqual([]);

  const spans = spanListSchema.parse((await get('/api/spans?pageSize=200')).body);
  expect(new Set(spans.items.map((s) => s.id))).toEqual(seen.spans);
  const ownGbps = expectedSpanGbps(ctx.demo, own);
  const allGbps = expectedSpanGbps(ctx.demo);
  for (const s of spans.items) expect(s.usedGbps).toBeCloseTo(ownGbps.get(s.id) ?? 0, 9);
  // Somewhere the network-wide load differs, so the check above could have failed.
  expect(spans.items.some((s) => Math.abs((allGbps.get(s.id) ?? 0) - s.usedGbps) > 1e-9)).toBe(true);
  expect(leaks(spans)).toEqual([]);
});

test('tenants list: only its own tenant', async () => {
  const body = tenantListSchema.parse((await get('/api/tenants')).body);
  expect(body.items.map((t) => t.id)).toEqual([ctx.demoTenantId]);
  expect(body.total).toBe(1);
});

test('details of another tenant\'s slice, tenant, site or span answer 404 exactly like unknown ids', async () => {
  const otherSlice = ctx.demo.slices.find((s) => !own.has(s.id))!;
  const otherTenant = ctx.demo.tenants.find((t) => t.id !== ctx.demoTenantId)!;
  const outsideSite = ctx.demo.sites.find((s) => !seen.sites.has(s.id))!;
  const outsideSpan = ctx.demo.spans.find((s) => !seen.spans.has(s.id))!;
  for (const [url, code] of [
    [`/api/slices/${otherSlice.id}`, 'SLICE_NOT_FOUND'], [`/api/tenants/${otherTenant.id}`, 'TENANT_NOT_FOUND'],
    [`/api/sites/${outsideSite.id}`, 'SITE_NOT_FOUND'], [`/api/spans/${outsideSpan.id}`, 'SPAN_NOT_FOUND'],
  ]) {
    const res = await get(url);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe(code);
    // Same answer as for an id that does not exist at all (the message only echoes the id asked for).
    const id = url.split('/').at(-1)!;
    const unknown = await get(url.replace(id, 'no-such-id'));
    expect(JSON.stringify(res.body).replace(id, 'no-such-id')).toBe(JSON.stringify(unknown.body));
  }
});

test('its own slice, tenant, and a shared site and span open, showing only its own slices', async () => {
  const mine = [...own][0];
  expect((await get(`/api/slices/${mine}`)).status).toBe(200);
  expect((await get(`/api/tenants/${ctx.demoTenantId}`)).status).toBe(200);
  // The busiest site and span of its footprint carry other tenants' slices too.
  const allCpu = expectedSiteCpu(ctx.demo);
  const site = [...seen.sites].sort((a, b) => (allCpu.get(b) ?? 0) - (allCpu.get(a) ?? 0))[0];
  const siteBody = siteDetailSchema.parse((await get(`/api/sites/${site}`)).body);
  for (const u of [...siteBody.hosted, ...siteBody.transit]) expect(own.has(u.sliceId)).toBe(true);
  expect(leaks(siteBody)).toEqual([]);
  const allGbps = expectedSpanGbps(ctx.demo);
  const span = [...seen.spans].sort((a, b) => (allGbps.get(b) ?? 0) - (allGbps.get(a) ?? 0))[0];
  const spanBody = spanDetailSchema.parse((await get(`/api/spans/${span}`)).body);
  expect(spanBody.slices.every((u) => own.has(u.sliceId))).toBe(true);
  expect(leaks(spanBody)).toEqual([]);
});

test('network map: only its footprint, with its own load', async () => {
  const body = networkMapSchema.parse((await get('/api/network/map')).body);
  expect(new Set(body.sites.map((s) => s.id))).toEqual(seen.sites);
  expect(new Set(body.spans.map((s) => s.id))).toEqual(seen.spans);
  const ownGbps = expectedSpanGbps(ctx.demo, own);
  for (const s of body.spans) expect(s.utilisation).toBeCloseTo((ownGbps.get(s.id) ?? 0) / s.capacityGbps, 9);
  expect(leaks(body)).toEqual([]);
});

test('exports are not for tenant users', async () => {
  expect((await get('/api/export/scenario')).status).toBe(403);
  expect((await get('/api/export/graphml')).status).toBe(403);
});
