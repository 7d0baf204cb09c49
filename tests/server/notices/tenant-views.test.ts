// Tenant views: a tenant user's window list, window detail and overview carry the work on its own slices in the
// words of its notice, from the time it was notified, and none of the window's internal fields.
import { tenantOverviewSchema, tenantWindowListSchema, tenantWindowViewSchema } from '../../../shared/tenant-windows';
import { internalNames } from './fixture';
import { leaksIn, setupTenantViews, type TenantViewsContext } from './tenant-fixture';

let ctx: TenantViewsContext;
let secrets: string[];
beforeAll(async () => {
  ctx = await setupTenantViews();
  const i = ctx.internals;
  secrets = [i.title, i.ownerName, i.notes, i.mopFileName, i.overrideReason, ...i.elementIds, ...internalNames(ctx.id),
    ctx.id('A'), ctx.id('B'), ctx.id('C'), ctx.otherTenantId, 'Other Harbour Co', 'Yard cameras', ctx.unnotified, ctx.blocked];
}, 60_000);
afterAll(async () => { await ctx.close(); });

const RANGE = 'from=2031-05-01T00:00:00Z&to=2031-07-01T00:00:00Z';

test('the fixture is meaningful: staff read every internal field of the notified window', async () => {
  const staff = (await (await ctx.as('planner'))('get', `/api/windows/${ctx.notified}`)).body;
  expect(staff).toMatchObject({
    title: ctx.internals.title, notes: ctx.internals.notes, freezeOverrideReason: ctx.internals.overrideReason,
    owner: { name: ctx.internals.ownerName }, mop: { fileName: ctx.internals.mopFileName },
  });
  expect(leaksIn(staff, secrets).keys).toEqual(expect.arrayContaining(['title', 'owner', 'elements', 'notes', 'mop']));
});

test('the list holds only the notified window, in tenant words, with no internal key or value', async () => {
  const res = await (await ctx.asTenant('tenant'))('get', `/api/windows?${RANGE}`);
  expect(res.status).toBe(200);
  const list = tenantWindowListSchema.parse(res.body);
  expect(list.windows.map((w) => w.windowId)).toEqual([ctx.notified]);
  expect(list.windows[0]).toMatchObject({
    summary: 'Planned network maintenance (fibre splice)', stage: 'planned', critical: true, durationHours: 4,
    slices: [{ name: 'Harbour pilots', outcome: 'stays' }, { name: 'Port cranes', outcome: 'move' }],
  });
  expect(leaksIn(res.body, secrets)).toEqual({ keys: [], values: [] });
});

test('the detail is the tenant view; a window not notified (none issued, or held back) is not found', async () => {
  const tenant = await ctx.asTenant('tenant');
  const res = await tenant('get', `/api/windows/${ctx.notified}`);
  expect(res.status).toBe(200);
  const view = tenantWindowViewSchema.parse(res.body);
  expect(view.noticeId).toEqual(expect.any(String));
  expect(view.whenLocal).toContain('GMT-1');
  expect(leaksIn(res.body, secrets)).toEqual({ keys: [], values: [] });
  for (const id of [ctx.unnotified, ctx.blocked]) {
    const hidden = await tenant('get', `/api/windows/${id}`);
    expect([hidden.status, hidden.body.error.code]).toEqual([404, 'WINDOW_NOT_FOUND']);
    expect(JSON.stringify(hidden.body)).not.toContain(ctx.internals.title);
  }
});

test('each tenant reads only its own slices of the same window', async () => {
  const res = await (await ctx.asTenant('otherTenant'))('get', `/api/windows/${ctx.notified}`);
  const view = tenantWindowViewSchema.parse(res.body);
  expect(view.slices.map((s) => s.name)).toEqual(['Yard cameras']);
  expect(view.effect).toBe('interruption');
  const own = [ctx.internals.title, ctx.internals.notes, 'Port cranes', 'Harbour pilots', ctx.tenantId, ctx.id('C')];
  expect(leaksIn(res.body, own)).toEqual({ keys: [], values: [] });
});

test('the overview lists and counts only the notified work, in tenant words', async () => {
  const res = await (await ctx.asTenant('tenant'))('get', '/api/overview');
  expect(res.status).toBe(200);
  const overview = tenantOverviewSchema.parse(res.body);
  expect(overview.nextWork.map((w) => w.windowId)).toEqual([ctx.notified]);
  expect(overview.windowsNext30Days).toBe(1);
  expect(overview.slices).toBe(2);
  expect(leaksIn(res.body, secrets)).toEqual({ keys: [], values: [] });
});

test("filters naming another tenant or an element answer 404; the tenant's own id and 'mine' do not leak", async () => {
  const tenant = await ctx.asTenant('tenant');
  const other = await tenant('get', `/api/windows?${RANGE}&tenant=${ctx.otherTenantId}`);
  expect([other.status, other.body.error.code]).toEqual([404, 'TENANT_NOT_FOUND']);
  const element = await tenant('get', `/api/windows?${RANGE}&element=${ctx.id('X1')}`);
  expect([element.status, element.body.error.code]).toEqual([404, 'ELEMENT_NOT_FOUND']);
  const own = tenantWindowListSchema.parse((await tenant('get', `/api/windows?${RANGE}&tenant=${ctx.tenantId}`)).body);
  expect(own.windows.map((w) => w.windowId)).toEqual([ctx.notified]);
  expect((await tenant('get', `/api/windows?${RANGE}&mine=true`)).body).toEqual({ windows: [] });
});

test('a tenant user without a tenant sees no work at all', async () => {
  const tenantless = await ctx.asTenant('tenantless');
  expect((await tenantless('get', `/api/windows?${RANGE}`)).body).toEqual({ windows: [] });
  expect((await tenantless('get', `/api/windows/${ctx.notified}`)).status).toBe(404);
  expect(tenantOverviewSchema.parse((await tenantless('get', '/api/overview')).body).nextWork).toEqual([]);
});
