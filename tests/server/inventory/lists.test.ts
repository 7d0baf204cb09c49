// GET /api/sites, /spans, /tenants, /slices: paging, sorting, searching and filtering on the seeded demo.
import request from 'supertest';
import {
  siteListSchema, sliceListSchema, spanListSchema, tenantListSchema,
} from '../../../shared/inventory';
import { spanLatencyMs } from '../../../shared/scenario';
import { signInAs } from '../helpers/sign-in';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;
let cookie: string;

beforeAll(async () => {
  ctx = await setupInventoryApp('lists');
  cookie = await signInAs(ctx.app, ctx.users.planner.email);
}, 60_000);
afterAll(() => ctx.close());

const get = (url: string) => request(ctx.app).get(url).set('Cookie', cookie);

test('sites: every demo site over pages of 20, with no overlap and the full total', async () => {
  const seen: string[] = [];
  for (let page = 1; page <= 3; page += 1) {
    const body = siteListSchema.parse((await get(`/api/sites?pageSize=20&page=${page}`)).body);
    expect(body.total).toBe(ctx.demo.sites.length);
    seen.push(...body.items.map((s) => s.id));
  }
  expect(new Set(seen).size).toBe(ctx.demo.sites.length);
  expect(new Set(seen)).toEqual(new Set(ctx.demo.sites.map((s) => s.id)));
});

test('sites: sorted by utilisation descending, filtered by kind, searched by name', async () => {
  const byUse = siteListSchema.parse((await get('/api/sites?sort=utilisation&order=desc&pageSize=200')).body);
  const use = byUse.items.map((s) => s.utilisation);
  expect(use).toEqual([...use].sort((a, b) => b - a));
  expect(use[0]).toBeGreaterThan(0);

  const cores = siteListSchema.parse((await get('/api/sites?kind=core&pageSize=200')).body);
  expect(cores.total).toBe(ctx.demo.sites.filter((s) => s.kind === 'core').length);
  expect(cores.items.every((s) => s.kind === 'core')).toBe(true);

  const target = ctx.demo.sites[7];
  const found = siteListSchema.parse((await get(`/api/sites?q=${encodeURIComponent(target.name.toUpperCase())}`)).body);
  expect(found.items.map((s) => s.id)).toContain(target.id);
  expect(found.items.every((s) => `${s.id} ${s.name}`.toLowerCase().includes(target.name.toLowerCase()))).toBe(true);
});

test('spans: sorted by latency ascending matches the format rule; site and srlg filters', async () => {
  const body = spanListSchema.parse((await get('/api/spans?sort=latencyMs&pageSize=200')).body);
  expect(body.total).toBe(ctx.demo.spans.length);
  const expected = ctx.demo.spans.map((s) => spanLatencyMs(s)).sort((a, b) => a - b);
  expect(body.items.map((s) => s.latencyMs)).toEqual(expected);

  const site = ctx.demo.sites[0].id;
  const atSite = spanListSchema.parse((await get(`/api/spans?site=${site}&pageSize=200`)).body);
  expect(atSite.total).toBe(ctx.demo.spans.filter((s) => s.a === site || s.b === site).length);

  const srlg = ctx.demo.spans.find((s) => s.srlg?.length)!.srlg![0];
  const inGroup = spanListSchema.parse((await get(`/api/spans?srlg=${encodeURIComponent(srlg)}&pageSize=200`)).body);
  expect(inGroup.total).toBe(ctx.demo.spans.filter((s) => s.srlg?.includes(srlg)).length);
});

test('spans: sorting by utilisation descending, second page continues the first', async () => {
  const all = spanListSchema.parse((await get('/api/spans?sort=utilisation&order=desc&pageSize=200')).body);
  const p2 = spanListSchema.parse((await get('/api/spans?sort=utilisation&order=desc&pageSize=10&page=2')).body);
  expect(p2.items.map((s) => s.id)).toEqual(all.items.slice(10, 20).map((s) => s.id));
  expect(p2).toMatchObject({ page: 2, pageSize: 10, total: ctx.demo.spans.length });
});

test('tenants: sorted by slice count, counts match the demo', async () => {
  const body = tenantListSchema.parse((await get('/api/tenants?sort=sliceCount&order=desc')).body);
  // The demo's tenants plus the one the test harness adds for its own users.
  expect(body.total).toBe(ctx.demo.tenants.length + 1);
  for (const row of body.items) {
    expect(row.sliceCount).toBe(ctx.demo.slices.filter((s) => s.tenant === row.id).length);
  }
  const counts = body.items.map((t) => t.sliceCount);
  expect(counts).toEqual([...counts].sort((a, b) => b - a));
});

test('slices: filters by tenant, sst, priority and critical combine', async () => {
  const tenant = ctx.demo.slices[0].tenant;
  const sst = ctx.demo.slices[0].sst;
  const body = sliceListSchema.parse((await get(`/api/slices?tenant=${tenant}&sst=${sst}&pageSize=200`)).body);
  expect(body.total).toBe(ctx.demo.slices.filter((s) => s.tenant === tenant && s.sst === sst).length);
  expect(body.items.every((s) => s.tenantId === tenant && s.sst === sst)).toBe(true);

  const critical = sliceListSchema.parse((await get('/api/slices?critical=true&pageSize=200')).body);
  expect(critical.total).toBe(ctx.demo.slices.filter((s) => s.critical).length);
  expect(critical.total).toBeGreaterThan(0);
  const notCritical = sliceListSchema.parse((await get('/api/slices?critical=false&pageSize=1')).body);
  expect(notCritical.total + critical.total).toBe(ctx.demo.slices.length);

  const p1 = sliceListSchema.parse((await get('/api/slices?priority=1&pageSize=200')).body);
  expect(p1.total).toBe(ctx.demo.slices.filter((s) => s.priority === 1).length);
});

test('slices: sorted by tenant name then id, by priority descending, and searched', async () => {
  const byTenant = sliceListSchema.parse((await get('/api/slices?sort=tenant&pageSize=200')).body);
  const names = byTenant.items.map((s) => s.tenantName);
  expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, 'en', { sensitivity: 'base' })));
  const byPriority = sliceListSchema.parse((await get('/api/slices?sort=priority&order=desc&pageSize=200')).body);
  expect(byPriority.items[0].priority).toBe(Math.max(...ctx.demo.slices.map((s) => s.priority)));
  const target = ctx.demo.slices[5];
  const found = sliceListSchema.parse((await get(`/api/slices?q=${encodeURIComponent(target.id)}`)).body);
  expect(found.items.map((s) => s.id)).toContain(target.id);
});

test('bad list parameters answer 400 VALIDATION_FAILED', async () => {
  for (const url of ['/api/sites?pageSize=201', '/api/spans?sort=nope', '/api/slices?critical=yes', '/api/tenants?page=0', '/api/slices?order=sideways']) {
    const res = await get(url);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('VALIDATION_FAILED');
  }
});
