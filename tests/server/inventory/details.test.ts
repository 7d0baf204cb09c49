// Detail endpoints: site, span, slice and tenant, with figures checked against the demo file itself.
import request from 'supertest';
import {
  siteDetailSchema, sliceDetailSchema, spanDetailSchema, tenantDetailSchema,
} from '../../../shared/inventory';
import { spanLatencyMs } from '../../../shared/scenario';
import { signInAs } from '../helpers/sign-in';
import { expectedSiteCpu, expectedSpanGbps } from './helpers/demo-expectations';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;
let cookie: string;
beforeAll(async () => {
  ctx = await setupInventoryApp('details');
  cookie = await signInAs(ctx.app, ctx.users.approver.email);
}, 60_000);
afterAll(() => ctx.close());

const get = (url: string) => request(ctx.app).get(url).set('Cookie', cookie);
const ids = (xs: { sliceId: string }[]) => xs.map((x) => x.sliceId).sort();

test('span detail: utilisation is the ties\' bandwidth over capacity, and it lists the slices crossing it', async () => {
  const used = expectedSpanGbps(ctx.demo);
  const [busiest] = [...used.entries()].sort((a, b) => b[1] - a[1]);
  const span = ctx.demo.spans.find((s) => s.id === busiest[0])!;
  const res = await get(`/api/spans/${span.id}`);
  expect(res.status).toBe(200);
  const body = spanDetailSchema.parse(res.body);
  expect(body.span.usedGbps).toBeCloseTo(busiest[1], 9);
  expect(body.span.utilisation).toBeCloseTo(busiest[1] / span.capacityGbps, 9);
  expect(body.span.latencyMs).toBeCloseTo(spanLatencyMs(span), 12);
  const crossing = ctx.demo.placements.filter((p) => Object.values(p.paths).some((path) => path.includes(span.id))).map((p) => p.slice);
  expect(ids(body.slices)).toEqual([...new Set(crossing)].sort());
  expect(body.span.sliceCount).toBe(new Set(crossing).size);
});

test('site detail: cpu used, its spans, hosted slices and transit slices', async () => {
  const cpu = expectedSiteCpu(ctx.demo);
  // A site that some tie passes through without ending there.
  const interior = new Map<string, Set<string>>();
  for (const slice of ctx.demo.slices) {
    const p = ctx.demo.placements.find((x) => x.slice === slice.id)!;
    for (const tie of slice.ties) {
      let at = p.sites[tie.from];
      p.paths[tie.id].forEach((spanId, i, path) => {
        const span = ctx.demo.spans.find((s) => s.id === spanId)!;
        at = span.a === at ? span.b : span.a;
        if (i < path.length - 1) interior.set(at, (interior.get(at) ?? new Set()).add(slice.id));
      });
    }
  }
  const [siteId, transit] = [...interior.entries()].find(([id]) => cpu.has(id)) ?? [...interior.entries()][0];
  const site = ctx.demo.sites.find((s) => s.id === siteId)!;
  const body = siteDetailSchema.parse((await get(`/api/sites/${siteId}`)).body);
  expect(body.site.cpuUsed).toBeCloseTo(cpu.get(siteId) ?? 0, 9);
  expect(body.site.utilisation).toBeCloseTo((cpu.get(siteId) ?? 0) / site.cpu, 9);
  expect(body.spans.map((s) => s.id).sort()).toEqual(ctx.demo.spans.filter((s) => s.a === siteId || s.b === siteId).map((s) => s.id).sort());
  const hosted = ctx.demo.placements.filter((p) => Object.values(p.sites).includes(siteId)).map((p) => p.slice);
  expect(ids(body.hosted)).toEqual(hosted.sort());
  expect(ids(body.transit)).toEqual([...transit].sort());
  expect(body.transit.every((u) => u.ties.length > 0)).toBe(true);
});

test('slice detail: functions at their sites, each tie\'s path with site sequence, latency and availability', async () => {
  const slice = ctx.demo.slices.find((s) => {
    const p = ctx.demo.placements.find((x) => x.slice === s.id)!;
    return s.ties.some((t) => p.paths[t.id].length >= 2);
  })!;
  const p = ctx.demo.placements.find((x) => x.slice === slice.id)!;
  const body = sliceDetailSchema.parse((await get(`/api/slices/${slice.id}`)).body);
  expect(body.slice).toMatchObject({ id: slice.id, name: slice.name, tenantId: slice.tenant, revision: 1, functionCount: slice.functions.length });
  for (const f of body.functions) expect(f.siteId).toBe(p.sites[f.id]);
  for (const tie of body.ties) {
    const spans = p.paths[tie.id].map((id) => ctx.demo.spans.find((s) => s.id === id)!);
    const from = ctx.demo.slices.find((s) => s.id === slice.id)!.ties.find((t) => t.id === tie.id)!;
    expect(tie.path!.spans).toEqual(p.paths[tie.id]);
    expect(tie.path!.sites).toHaveLength(spans.length + 1);
    expect(tie.path!.sites[0]).toBe(p.sites[from.from]);
    expect(tie.path!.sites.at(-1)).toBe(p.sites[from.to]);
    expect(tie.path!.latencyMs).toBeCloseTo(spans.reduce((ms, s) => ms + (s.latencyMs ?? s.lengthKm * 0.005), 0), 12);
    // A = MTBF / (MTBF + MTTR) per span, in series (ITU-T E.800 definition; series product is common practice).
    const a = spans.reduce((prod, s) => prod * (s.mtbfHours && s.mttrHours ? s.mtbfHours / (s.mtbfHours + s.mttrHours) : 1), 1);
    expect(tie.path!.availability).toBeCloseTo(a, 12);
  }
  expect(body.history).toHaveLength(1);
  expect(body.history[0]).toMatchObject({ revision: 1, current: true, sites: p.sites, paths: p.paths });
});

test('tenant detail: its contacts and every slice it owns', async () => {
  const tenant = ctx.demo.tenants.find((t) => t.contacts?.length)!;
  const body = tenantDetailSchema.parse((await get(`/api/tenants/${tenant.id}`)).body);
  expect(body.tenant).toMatchObject({ id: tenant.id, name: tenant.name, noticeDays: tenant.noticeDays, contactCount: tenant.contacts!.length });
  expect(body.contacts).toEqual(tenant.contacts);
  expect(body.slices.map((s) => s.id).sort()).toEqual(ctx.demo.slices.filter((s) => s.tenant === tenant.id).map((s) => s.id).sort());
});

test('unknown ids answer 404 with a code per kind', async () => {
  const cases = [['sites', 'SITE_NOT_FOUND'], ['spans', 'SPAN_NOT_FOUND'], ['slices', 'SLICE_NOT_FOUND'], ['tenants', 'TENANT_NOT_FOUND']];
  for (const [path, code] of cases) {
    const res = await get(`/api/${path}/no-such-id`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe(code);
  }
});
