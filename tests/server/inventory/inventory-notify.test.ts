// Two caches on two pools, as two processes would hold them: a write through one reaches the other through
// LISTEN/NOTIFY and is built there before anyone reads it, also after the listening connection was cut.
import { eq } from 'drizzle-orm';
import { createDb, type Db } from '../../../db/client';
import { sites } from '../../../db/schema';
import { selectInventoryRevision } from '../../../server/queries/inventory/inventory-revision';
import { InventoryCache } from '../../../server/services/inventory/inventory-cache';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';
import { eventually } from '../../e2e/helpers/eventually';

let ctx: InventoryContext;
const opened: { db: Db; close: () => Promise<void> }[] = [];
const caches: InventoryCache[] = [];

beforeAll(async () => {
  ctx = await setupInventoryApp('cache_notify');
}, 60_000);
afterAll(async () => {
  await Promise.all(caches.map((c) => c.close()));
  await Promise.all(opened.map((o) => o.close()));
  await ctx.close();
});

/** A process's worth: its own pool and its own listening cache. */
async function processCache(): Promise<{ db: Db; cache: InventoryCache }> {
  const { db, pool } = createDb(ctx.databaseUrl, { max: 2 });
  opened.push({ db, close: () => pool.end() });
  const cache = new InventoryCache(db);
  caches.push(cache);
  await cache.listen(ctx.databaseUrl);
  return { db, cache };
}

test('a write through one process is built by the other from the notification, before any read there', async () => {
  const a = await processCache();
  const b = await processCache();
  const site = ctx.demo.sites[0];
  await a.db.update(sites).set({ name: 'Announced rename' }).where(eq(sites.id, site.id));
  const revision = await selectInventoryRevision(a.db);
  await eventually(() => expect(b.cache.revision).toBe(revision));
  const builds = b.cache.builds;
  const view = await b.cache.view(null);
  expect(b.cache.builds).toBe(builds);
  expect(view.siteById.get(site.id)?.name).toBe('Announced rename');
});

test('after the listening connection is cut, it comes back and catches up', async () => {
  const a = await processCache();
  const b = await processCache();
  await eventually(() => expect(b.cache.revision).not.toBeNull());
  const cut = await ctx.pool.query(
    "select pg_terminate_backend(pid) from pg_stat_activity where application_name = 'slackwater inventory listener' and datname = current_database()",
  );
  expect(cut.rowCount).toBeGreaterThanOrEqual(2);
  const site = ctx.demo.sites[1];
  await a.db.update(sites).set({ name: 'Renamed while cut off' }).where(eq(sites.id, site.id));
  const revision = await selectInventoryRevision(a.db);
  await eventually(() => expect(b.cache.revision).toBe(revision));
});
