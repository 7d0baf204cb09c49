// Who sees which windows: tenant scoping of list, detail and impact; list filters; roles.
import { windowListSchema } from '../../../shared/windows';
import { windowImpactSchema } from '../../../shared/window-impact';
import { booking, insertRing } from './helpers/ring-fixture';
import { setupWindowsApp, type WindowsContext } from './helpers/windows-app';

// This file books in September 2027 only.
const NOW = new Date('2027-03-01T08:00:00Z');
const RANGE = 'from=2027-09-01T00:00:00Z&to=2027-10-01T00:00:00Z';
let ctx: WindowsContext;
let id: (name: string) => string;
let otherTenantId: string;
const w: Record<string, string> = {};

beforeAll(async () => {
  ctx = await setupWindowsApp(NOW);
  ({ id, otherTenantId } = await insertRing(ctx.db, { prefix: ctx.prefix, ownTenantId: ctx.tenantId }));
  const book = async (key: string, role: 'engineer' | 'admin', day: number, kind: 'site' | 'span', el: string) => {
    const res = await (await ctx.as(role))('post', '/api/windows').send(booking(ctx.prefix, key,
      `2027-09-${day}T10:00:00Z`, `2027-09-${day}T12:00:00Z`, [{ kind, id: id(el), effect: 'down' }]));
    expect(res.status).toBe(201);
    w[key] = res.body.window.id;
  };
  await book('own-transit', 'engineer', 10, 'span', 'r23'); // crosses the own slice's path
  await book('other-only', 'engineer', 11, 'span', 'r56'); // only the other tenant's slice
  await book('transit-site', 'admin', 12, 'site', 'R2'); // a site the own slice's path runs through
  await book('withdrawn', 'engineer', 13, 'site', 'R1');
  await (await ctx.as('engineer'))('post', `/api/windows/${w.withdrawn}/transition`).send({ to: 'withdrawn', version: 1 });
});
afterAll(async () => {
  await ctx.cleanup();
  await ctx.close();
});

const listIds = async (role: keyof WindowsContext['users'], query = '') => {
  const res = await (await ctx.as(role))('get', `/api/windows?${RANGE}${query}`);
  expect(res.status).toBe(200);
  return windowListSchema.parse(res.body).windows.map((x) => x.id);
};

test('a tenant user lists only active windows touching its own slices; staff see all', async () => {
  expect(await listIds('tenant')).toEqual([w['own-transit'], w['transit-site']]);
  expect(await listIds('approver')).toEqual([w['own-transit'], w['other-only'], w['transit-site'], w.withdrawn]);
});

test("a tenant user gets 404 for another tenant's window, its impact and conflicts", async () => {
  const tenant = await ctx.as('tenant');
  await (await ctx.as('planner'))('post', `/api/windows/${w['other-only']}/assess`).send({});
  for (const path of ['', '/impact', '/conflicts']) {
    const res = await tenant('get', `/api/windows/${w['other-only']}${path}`);
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('WINDOW_NOT_FOUND');
  }
  expect((await tenant('get', `/api/windows/${w['own-transit']}`)).status).toBe(200);
});

test("a tenant sees only its own slices in an impact, and no other tenant's loads or paths", async () => {
  await (await ctx.as('planner'))('post', `/api/windows/${w['own-transit']}/assess`).send({});
  const staff = windowImpactSchema.parse((await (await ctx.as('planner'))('get', `/api/windows/${w['own-transit']}/impact`)).body);
  expect(staff.affected.map((a) => a.tenant.id).sort()).toEqual([ctx.tenantId, otherTenantId].sort());
  const res = await (await ctx.as('tenant'))('get', `/api/windows/${w['own-transit']}/impact`);
  expect(res.status).toBe(200);
  const scoped = windowImpactSchema.parse(res.body);
  expect(scoped.affected.map((a) => a.slice)).toEqual([id('own')]);
  expect(scoped.currentPaths.map((p) => p.slice)).toEqual([id('own')]);
  expect(scoped.overloaded).toEqual([]);
  expect(JSON.stringify(scoped)).not.toContain(otherTenantId);
});

test("a tenant's touchesCritical counts only its own critical slices", async () => {
  const planner = await ctx.as('planner');
  await planner('post', `/api/windows/${w['transit-site']}/assess`).send({});
  // Staff see the flag from the own slice (critical); the tenant owns that slice, so it sees it too.
  const staffRead = (await planner('get', `/api/windows/${w['transit-site']}`)).body;
  const tenantRead = (await (await ctx.as('tenant'))('get', `/api/windows/${w['transit-site']}`)).body;
  expect([staffRead.touchesCritical, tenantRead.touchesCritical]).toEqual([true, true]);
  // Make the other tenant's slice critical instead: staff still see a critical touch via the impact; the tenant does not.
  await ctx.pool.query(`update window_impacts set impact = jsonb_set(impact, '{affected}', (
    select jsonb_agg(case when a->'tenant'->>'id' = $2 then jsonb_set(a, '{critical}', 'false') else jsonb_set(a, '{critical}', 'true') end)
    from jsonb_array_elements(impact->'affected') a)) where window_id = $1`, [w['transit-site'], ctx.tenantId]);
  const tenantAfter = (await (await ctx.as('tenant'))('get', `/api/windows/${w['transit-site']}`)).body;
  expect(tenantAfter.touchesCritical).toBe(false);
});

test('filters: mine, status, element and affected tenant', async () => {
  expect(await listIds('admin', '&mine=true')).toEqual([w['transit-site']]);
  expect(await listIds('planner', '&status=withdrawn')).toEqual([w.withdrawn]);
  expect(await listIds('planner', '&status=draft,assessed')).toEqual([w['own-transit'], w['other-only'], w['transit-site']]);
  expect(await listIds('planner', `&element=${id('R2')}`)).toEqual([w['transit-site']]);
  expect(await listIds('planner', `&tenant=${otherTenantId}`)).toEqual([w['other-only']]);
});

test('the range picks windows overlapping it, by instant', async () => {
  const res = await (await ctx.as('planner'))('get', '/api/windows?from=2027-09-10T13:00:00%2B02:00&to=2027-09-10T13:30:00%2B02:00');
  expect(res.body.windows.map((x: { id: string }) => x.id)).toEqual([w['own-transit']]); // 11:00–11:30 UTC inside 10–12
});

test('bad queries and missing roles are refused', async () => {
  const planner = await ctx.as('planner');
  expect((await planner('get', '/api/windows?from=yesterday&to=2027-10-01T00:00:00Z')).body.error.code).toBe('VALIDATION_FAILED');
  expect((await planner('get', `/api/windows?${RANGE}&status=sideways`)).body.error.code).toBe('VALIDATION_FAILED');
  expect((await (await ctx.as('noRoles'))('get', `/api/windows?${RANGE}`)).status).toBe(403);
  expect((await (await ctx.as('planner'))('get', '/api/windows/no-such-window')).status).toBe(404);
});
