// loadNetworkScenario / loadInventory: the seeded demo comes back as the same scenario (windows aside).
import { placements } from '../../../db/schema';
import { loadNetworkScenario } from '../../../server/services/inventory/load-network-scenario';
import { loadInventory } from '../helpers/load-inventory';
import { validateScenario } from '../../../shared/scenario-validate';
import { and, eq } from 'drizzle-orm';
import { normalised } from './helpers/demo-expectations';
import { setupInventoryApp, type InventoryContext } from './helpers/inventory-app';

let ctx: InventoryContext;
beforeAll(async () => { ctx = await setupInventoryApp('load'); }, 60_000);
afterAll(() => ctx.close());

test('the seeded demo loads back equal to the file, with its name and outline and without windows', async () => {
  const loaded = await loadNetworkScenario(ctx.db);
  expect(loaded.windows).toBeUndefined();
  expect(loaded.name).toBe(ctx.demo.name);
  expect(loaded.outline).toEqual(ctx.demo.outline);
  // The test harness adds one tenant of its own; drop it before comparing with the file.
  const withoutHarness = { ...loaded, tenants: loaded.tenants.filter((t) => t.id !== ctx.tenantId) };
  const { windows: _w, ...file } = ctx.demo;
  expect(normalised(withoutHarness)).toEqual(normalised(file));
  expect(validateScenario(loaded).ok).toBe(true);
});

test('functions follow their slice\'s chain of ties, as people read them', async () => {
  const loaded = await loadNetworkScenario(ctx.db);
  const fromFile = ctx.demo.slices.find((s) => s.ties.length >= 2)!;
  const back = loaded.slices.find((s) => s.id === fromFile.id)!;
  expect(back.functions.map((f) => f.id)).toEqual(fromFile.functions.map((f) => f.id));
});

test('only the current placement revision is loaded', async () => {
  const slice = ctx.demo.slices[0];
  const p = ctx.demo.placements.find((x) => x.slice === slice.id)!;
  const otherSite = ctx.demo.sites.find((s) => s.id !== p.sites[slice.functions[0].id])!.id;
  await ctx.db.update(placements).set({ current: false }).where(and(eq(placements.sliceId, slice.id), eq(placements.revision, 1)));
  await ctx.db.insert(placements).values({
    sliceId: slice.id, revision: 2, current: true, sites: { ...p.sites, [slice.functions[0].id]: otherSite }, paths: p.paths,
  });
  const { scenario, inventory } = await loadInventory(ctx.db);
  expect(scenario.placements.filter((x) => x.slice === slice.id)).toHaveLength(1);
  expect(scenario.placements.find((x) => x.slice === slice.id)!.sites[slice.functions[0].id]).toBe(otherSite);
  const idx = inventory.sliceIndex.get(slice.id)!;
  expect(inventory.network.sites[inventory.placements[idx].sites[0]].id).toBe(otherSite);
});
