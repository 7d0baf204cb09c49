// Who sees which windows: tenants see no draft work at all; list filters; roles.
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

// Tenant users read only windows they were notified of, as tenant views (tests/server/notices/tenant-views.test.ts);
// every window here is a draft, so none exists for the tenant — not even the ones touching its slices.
test('a tenant user lists none of the drafts, even those touching its slices; staff see all', async () => {
  const res = await (await ctx.as('tenant'))('get', `/api/windows?${RANGE}`);
  expect(res.status).toBe(200);
  expect(res.body).toEqual({ windows: [] });
  expect(await listIds('approver')).toEqual([w['own-transit'], w['other-only'], w['transit-site'], w.withdrawn]);
});

test('a tenant user gets 404 for every draft window, its impact and conflicts, its own slices touched or not', async () => {
  const tenant = await ctx.as('tenant');
  const planner = await ctx.as('planner');
  for (const key of ['other-only', 'own-transit']) {
    await planner('post', `/api/windows/${w[key]}/assess`).send({});
    for (const path of ['', '/impact', '/conflicts']) {
      const res = await tenant('get', `/api/windows/${w[key]}${path}`);
      expect([key, path, res.status, res.body.error?.code]).toEqual([key, path, 404, 'WINDOW_NOT_FOUND']);
    }
  }
  // Staff still read the whole impact, every tenant's slices included.
  const staff = windowImpactSchema.parse((await planner('get', `/api/windows/${w['own-transit']}/impact`)).body);
  expect(staff.affected.map((a) => a.tenant.id).sort()).toEqual([ctx.tenantId, otherTenantId].sort());
});

test('staff read touchesCritical from the stored impact', async () => {
  const planner = await ctx.as('planner');
  await planner('post', `/api/windows/${w['transit-site']}/assess`).send({});
  expect((await planner('get', `/api/windows/${w['transit-site']}`)).body.touchesCritical).toBe(true);
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
