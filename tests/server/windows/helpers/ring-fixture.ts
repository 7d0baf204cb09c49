// A six-site ring with two tenants' slices, ids prefixed per test file.
//
//   R1 ─r12─ R2 ─r23─ R3
//   │                  │
//  r61                r34
//   │                  │
//   R6 ─r56─ R5 ─r45─ R4
//
// own slice (the test tenant's, critical): functions on R1 and R4, tie over r12, r23, r34
// other slice (another tenant):            functions on R5 and R6, tie over r56
// Taking out r23 alone or r56 alone leaves the ring connected; both together cut it in two.
import type { Db } from '../../../../db/client';
import { placements, sites, sliceFunctions, sliceTies, slices, spans, tenants } from '../../../../db/schema';

export async function insertRing(db: Db, { prefix, ownTenantId }: { prefix: string; ownTenantId: string }) {
  const id = (name: string) => `${prefix}-${name}`;
  const otherTenantId = id('other-tenant');
  await db.insert(tenants).values({ id: otherTenantId, name: `${prefix} Other tenant`, noticeDays: 3 });
  await db.insert(sites).values([1, 2, 3, 4, 5, 6].map((n) => ({
    id: id(`R${n}`), name: `Ring ${n}`, kind: 'edge' as const, lat: 10 + n / 100, lon: 10, cpu: 32, mtbfHours: 50_000,
  })));
  const ring: [string, string, string][] = [['r12', 'R1', 'R2'], ['r23', 'R2', 'R3'], ['r34', 'R3', 'R4'],
    ['r45', 'R4', 'R5'], ['r56', 'R5', 'R6'], ['r61', 'R6', 'R1']];
  await db.insert(spans).values(ring.map(([k, a, b]) => ({
    id: id(k), siteA: id(a), siteB: id(b), capacityGbps: 10, lengthKm: 10, mtbfHours: 20_000,
  })));
  await db.insert(slices).values([
    { id: id('own'), tenantId: ownTenantId, name: 'Own control', sst: 2, priority: 1, critical: true },
    { id: id('other'), tenantId: otherTenantId, name: 'Other video', sst: 1, priority: 3 },
  ]);
  await db.insert(sliceFunctions).values([
    { id: id('own-f1'), sliceId: id('own'), cpu: 2 }, { id: id('own-f2'), sliceId: id('own'), cpu: 2 },
    { id: id('oth-f1'), sliceId: id('other'), cpu: 2 }, { id: id('oth-f2'), sliceId: id('other'), cpu: 2 },
  ]);
  await db.insert(sliceTies).values([
    { id: id('own-e1'), sliceId: id('own'), fromFunction: id('own-f1'), toFunction: id('own-f2'), bandwidthGbps: 1, maxLatencyMs: 50 },
    { id: id('oth-e1'), sliceId: id('other'), fromFunction: id('oth-f1'), toFunction: id('oth-f2'), bandwidthGbps: 1, maxLatencyMs: 50 },
  ]);
  await db.insert(placements).values([
    { sliceId: id('own'), revision: 1, sites: { [id('own-f1')]: id('R1'), [id('own-f2')]: id('R4') },
      paths: { [id('own-e1')]: [id('r12'), id('r23'), id('r34')] } },
    { sliceId: id('other'), revision: 1, sites: { [id('oth-f1')]: id('R5'), [id('oth-f2')]: id('R6') },
      paths: { [id('oth-e1')]: [id('r56')] } },
  ]);
  return { id, otherTenantId };
}

type Element = { kind: 'site' | 'span'; id: string; effect: 'down' | 'reduced'; fraction?: number };

/** A booking body; titles carry the prefix so cleanup finds the windows. */
export function booking(prefix: string, title: string, startsAt: string, endsAt: string, elements: Element[], extra: Record<string, unknown> = {}) {
  return { title: `${prefix} ${title}`, startsAt, endsAt, workType: 'fibre splice', elements, ...extra };
}
