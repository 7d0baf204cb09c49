// A small network with two tenants' slices and windows around `now`, ids prefixed per test file.
//
//   A ──k1── B ──k2── C ──k3── D      own tenant: slice on A and C, its tie crossing k1, k2 (B is transit)
//                                     other tenant: slice on C and D over k3
import type { Db } from '../../../db/client';
import { placements, sites, slices, spans, tenants, windowElements, windows } from '../../../db/schema';

const DAY_MS = 86_400_000;

type WindowSpec = { key: string; startDays: number; element: ['site' | 'span', string]; status?: 'draft' | 'withdrawn'; effect?: 'down' | 'reduced' };

export const FIXTURE_WINDOWS: WindowSpec[] = [
  { key: 'transit-b', startDays: 5, element: ['site', 'B'] },
  { key: 'other-k3', startDays: 6, element: ['span', 'k3'] },
  { key: 'shared-c', startDays: 10, element: ['site', 'C'], effect: 'reduced' },
  { key: 'withdrawn-a', startDays: 12, element: ['site', 'A'], status: 'withdrawn' },
  { key: 'late-k1', startDays: 40, element: ['span', 'k1'] },
  { key: 'past-a', startDays: -10, element: ['site', 'A'] },
];

export async function insertNetworkFixture(db: Db, { prefix, ownTenantId, now }: { prefix: string; ownTenantId: string; now: Date }) {
  const id = (name: string) => `${prefix}-${name}`;
  const otherTenantId = id('other-tenant');
  await db.insert(tenants).values({ id: otherTenantId, name: 'Other tenant', noticeDays: 3 });
  await db.insert(sites).values(['A', 'B', 'C', 'D'].map((s, i) => ({ id: id(s), name: `Site ${s}`, kind: 'edge' as const, lat: 10 + i / 10, lon: 10, cpu: 16 })));
  await db.insert(spans).values([['k1', 'A', 'B'], ['k2', 'B', 'C'], ['k3', 'C', 'D']].map(([k, a, b]) => ({
    id: id(k), siteA: id(a), siteB: id(b), capacityGbps: 10, lengthKm: 10,
  })));
  await db.insert(slices).values([
    { id: id('own-slice'), tenantId: ownTenantId, name: 'Own', sst: 2, priority: 1, critical: true },
    { id: id('other-slice-1'), tenantId: otherTenantId, name: 'Other 1', sst: 1, priority: 3, critical: true },
    { id: id('other-slice-2'), tenantId: otherTenantId, name: 'Other 2', sst: 1, priority: 3 },
  ]);
  await db.insert(placements).values([
    // An older, no longer current revision that touched D: it must not count.
    { sliceId: id('own-slice'), revision: 1, current: false, sites: { f1: id('D'), f2: id('D') }, paths: { e1: [] } },
    { sliceId: id('own-slice'), revision: 2, sites: { f1: id('A'), f2: id('C') }, paths: { e1: [id('k1'), id('k2')] } },
    { sliceId: id('other-slice-1'), revision: 1, sites: { g1: id('C'), g2: id('D') }, paths: { e2: [id('k3')] } },
    { sliceId: id('other-slice-2'), revision: 1, sites: { h1: id('D') }, paths: {} },
  ]);
  for (const w of FIXTURE_WINDOWS) {
    const startsAt = new Date(now.getTime() + w.startDays * DAY_MS);
    await db.insert(windows).values({
      id: id(w.key), title: `Window ${w.key}`, startsAt, endsAt: new Date(startsAt.getTime() + 4 * 3_600_000), status: w.status ?? 'draft',
    });
    const effect = w.effect ?? 'down';
    await db.insert(windowElements).values({
      windowId: id(w.key), elementKind: w.element[0], elementId: id(w.element[1]), effect, fraction: effect === 'reduced' ? 0.5 : null,
    });
  }
  return { id, otherTenantId };
}
