// Every inventory read route: 401 signed out; open to every signed-in role (staff see the whole network).
import request from 'supertest';
import { networkMapSchema } from '../../../shared/inventory';
import { signInAs } from '../helpers/sign-in';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;
beforeAll(async () => { ctx = await setupInventoryApp('access'); }, 60_000);
afterAll(() => ctx.close());

const routes = () => [
  '/api/sites', `/api/sites/${ctx.demo.sites[0].id}`, '/api/spans', `/api/spans/${ctx.demo.spans[0].id}`,
  '/api/tenants', `/api/tenants/${ctx.demo.tenants[0].id}`, '/api/slices', `/api/slices/${ctx.demo.slices[0].id}`,
  '/api/network/map',
];

test('signed out: 401 UNAUTHENTICATED on every inventory route', async () => {
  for (const url of routes()) {
    const res = await request(ctx.app).get(url);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHENTICATED');
  }
});

test('engineer, approver and admin read every route', async () => {
  for (const user of [ctx.users.engineer, ctx.users.approver, ctx.users.admin]) {
    const cookie = await signInAs(ctx.app, user.email);
    for (const url of routes()) expect([url, (await request(ctx.app).get(url).set('Cookie', cookie)).status]).toEqual([url, 200]);
  }
}, 30_000);

test('the map carries the outline and name, and every site and span with utilisation', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.planner.email);
  const body = networkMapSchema.parse((await request(ctx.app).get('/api/network/map').set('Cookie', cookie)).body);
  expect(body.name).toBe(ctx.demo.name);
  expect(body.outline).toEqual(ctx.demo.outline);
  expect(body.sites).toHaveLength(ctx.demo.sites.length);
  expect(body.spans).toHaveLength(ctx.demo.spans.length);
  expect(body.spans.some((s) => s.utilisation > 0)).toBe(true);
});
