// GET /api/overview: network figures for staff, only its own footprint for a tenant user.
import request from 'supertest';
import { overviewSchema } from '../../shared/api';
import { tenantOverviewSchema } from '../../shared/tenant-windows';
import { insertNetworkFixture } from './helpers/network-fixture';
import { signInAs } from './helpers/sign-in';
import { setupTestApp, type TestContext } from './helpers/test-app';

let ctx: TestContext;
let id: (name: string) => string;
// A fixed clock keeps "next 30 days" independent of when the suite runs.
const NOW = new Date('2031-03-01T08:00:00Z');

beforeAll(async () => {
  ctx = await setupTestApp();
  ({ id } = await insertNetworkFixture(ctx.db, { prefix: ctx.prefix, ownTenantId: ctx.tenantId, now: NOW }));
});
afterAll(() => ctx.close());

const bodyAs = async (email: string) => {
  const app = ctx.makeApp({ now: () => NOW });
  const cookie = await signInAs(app, email);
  const res = await request(app).get('/api/overview').set('Cookie', cookie);
  expect(res.status).toBe(200);
  return res.body as unknown;
};
const overviewAs = async (email: string) => overviewSchema.strict().parse(await bodyAs(email));

// The fixture's windows are drafts nobody told the tenant of: they are neither listed nor counted for it (a
// tenant reads only notified work, tests/server/notices/tenant-views.test.ts); its footprint's figures stay.
test('a tenant user sees only its own slices, and no window it was not notified of', async () => {
  const overview = tenantOverviewSchema.parse(await bodyAs(ctx.users.tenant.email));
  expect(overview).toEqual({
    scope: 'tenant',
    sites: 3, // A and C host functions, B is crossed by the tie; D only in a superseded revision
    spans: 2, // k1, k2
    tenants: 1,
    slices: 1,
    criticalSlices: 1,
    windowsNext30Days: 0, // transit-b and shared-c touch its slices but are drafts
    nextWork: [],
  });
});

test('staff see the whole network, including the other tenant and its window', async () => {
  const overview = await overviewAs(ctx.users.engineer.email);
  // Other test files share the database, so network-wide counts are lower bounds here.
  expect(overview.sites).toBeGreaterThanOrEqual(4);
  expect(overview.spans).toBeGreaterThanOrEqual(3);
  expect(overview.tenants).toBeGreaterThanOrEqual(2);
  expect(overview.slices).toBeGreaterThanOrEqual(3);
  expect(overview.criticalSlices).toBeGreaterThanOrEqual(2);
  expect(overview.windowsNext30Days).toBeGreaterThanOrEqual(3);
  expect(overview.nextWindows.length).toBeLessThanOrEqual(5);
  // Nothing else in the test data lies in 2031, so the other tenant's window is among the next five.
  expect(overview.nextWindows.map((w) => w.id)).toContain(id('other-k3'));
});

test('without a session: 401', async () => {
  expect((await request(ctx.app).get('/api/overview')).status).toBe(401);
});
