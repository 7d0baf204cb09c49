// The inventory revision (bumped by every write in its own transaction) and the per-process cache built on it.
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { sites } from '../../../db/schema';
import { selectInventoryRevision } from '../../../server/queries/inventory/inventory-revision';
import { InventoryCache } from '../../../server/services/inventory/inventory-cache';
import { siteDetailSchema } from '../../../shared/inventory';
import { signInAs } from '../helpers/sign-in';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;

beforeAll(async () => {
  ctx = await setupInventoryApp('cache');
}, 60_000);
afterAll(() => ctx.close());

const renameSite = (id: string, name: string) => ctx.db.update(sites).set({ name }).where(eq(sites.id, id));

test('a write to an inventory table bumps the revision; a rolled-back write does not', async () => {
  const site = ctx.demo.sites[0];
  const before = await selectInventoryRevision(ctx.db);
  await renameSite(site.id, 'Renamed once');
  const after = await selectInventoryRevision(ctx.db);
  expect(after).toBeGreaterThan(before);

  await expect(ctx.db.transaction(async (tx) => {
    await tx.update(sites).set({ name: 'Never kept' }).where(eq(sites.id, site.id));
    expect(await selectInventoryRevision(tx)).toBeGreaterThan(after);
    throw new Error('roll back');
  })).rejects.toThrow('roll back');
  expect(await selectInventoryRevision(ctx.db)).toBe(after);
  await renameSite(site.id, site.name);
});

test('reads of one revision share one build, and a write is seen by the next read', async () => {
  const cache = new InventoryCache(ctx.db);
  const views = await Promise.all([cache.view(null), cache.view(null), cache.view(ctx.demoTenantId), cache.view(null)]);
  expect(cache.builds).toBe(1);
  expect(views[1]).toBe(views[0]);
  expect(await cache.view(null)).toBe(views[0]);
  expect(cache.builds).toBe(1);

  const site = ctx.demo.sites[1];
  await renameSite(site.id, 'Renamed for the cache');
  const fresh = await cache.view(null);
  expect(cache.builds).toBe(2);
  expect(fresh.siteById.get(site.id)?.name).toBe('Renamed for the cache');
  expect(cache.revision).toBe(await selectInventoryRevision(ctx.db));
  await renameSite(site.id, site.name);
});

test('a tenant view keeps to its footprint and is reused within the revision', async () => {
  const cache = new InventoryCache(ctx.db);
  const mine = await cache.view(ctx.demoTenantId);
  expect(mine.slices.length).toBeGreaterThan(0);
  expect(mine.slices.every((s) => s.tenant === ctx.demoTenantId)).toBe(true);
  expect(mine.sites.length).toBeLessThan(ctx.demo.sites.length);
  expect(await cache.view(ctx.demoTenantId)).toBe(mine);
});

test('inside a transaction the cached copy is used only while the transaction sees its revision', async () => {
  const cache = new InventoryCache(ctx.db);
  const cached = await cache.compiled();
  const site = ctx.demo.sites[2];
  await ctx.db.transaction(async (tx) => {
    expect(await cache.compiledIn(tx)).toBe(cached);
    await tx.update(sites).set({ name: 'Only in this transaction' }).where(eq(sites.id, site.id));
    const own = await cache.compiledIn(tx);
    expect(own).not.toBe(cached);
    expect(own.scenario.sites.find((s) => s.id === site.id)?.name).toBe('Only in this transaction');
    tx.rollback();
  }).catch((err: unknown) => {
    if (!(err instanceof Error) || !/rollback/i.test(err.message)) throw err;
  });
  expect((await cache.compiled()).scenario.sites.find((s) => s.id === site.id)?.name).toBe(site.name);
});

test('the site detail answers the new name right after a write through the same pool (read-your-writes)', async () => {
  const cookie = await signInAs(ctx.app, ctx.users.planner.email);
  const site = ctx.demo.sites[3];
  const get = async () => siteDetailSchema.parse((await request(ctx.app).get(`/api/sites/${site.id}`).set('Cookie', cookie)).body);
  expect((await get()).site.name).toBe(site.name);
  await renameSite(site.id, 'Renamed between two reads');
  expect((await get()).site.name).toBe('Renamed between two reads');
  await renameSite(site.id, site.name);
});
