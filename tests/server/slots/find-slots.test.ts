// The slot finder on a hand-built network where the best slot is known. The work takes site X down for 4 hours
// (00:00–04:00 in the network's zone) on one of five nights:
//
//   A ──ax── X ──xb── B       X and Y have room for 8 vCPU each; A and B for 1.
//   └──ay── Y ──yb───┘        "Emergency dispatch" (critical): f1 (4 vCPU) on X, f2 on A, tie over ax.
//                             "Meter readings" (tenant owed 10 days' notice): g1 (2 vCPU) on X.
//
// With X down both slices can move to Y. Night 1 lies in a freeze; night 2 has a window that also takes X out;
// night 3 is less than 10 days away; on night 4 a window reduces Y to a tenth of its capacity (no conflict by
// the pair rules: nothing shared, nothing split), so the critical slice has nowhere to go; night 5 is clean.
// Night 6 (outside the main search's range) has a window at the same time on B and Z, a leaf beyond B where the
// critical "Alarm relay" is fixed: that window strands it on its own, so it must not count against X's night.
import { like, sql } from 'drizzle-orm';
import { createDb, type Db } from '../../../db/client';
import {
  freezes, placements, sites, sliceFunctions, sliceTies, slices, spans, tenants, windowElements, windows,
} from '../../../db/schema';
import { inventoryCacheFor } from '../../../server/services/inventory/inventory-cache';
import { threadRemapper } from '../../../server/jobs/slot-remap-thread';
import { quickRemap, type QuickRemapper } from '../../../server/services/slots/quick-remap';
import { summaryText } from '../../../components/slots/slot-words';
import { processRemapCache } from '../../../server/services/slots/remap-cache';
import {
  checkSlotRequest, elementsClash, findSlots, findSlotsForGroups, SlotRequestError, SlotSearchCancelledError,
  type GroupSlots,
} from '../../../server/services/slots/find-slots';
import { currentInventory } from '../../../server/services/inventory/inventory-cache';
import { namesOf } from '../../../server/services/slots/slot-words';
import { slotSearchCreateSchema, type SearchProgress, type SlotSearchRequest } from '../../../shared/slots';
import type pg from 'pg';
import { useScratchDatabase } from '../helpers/scratch-database';
import { migrateTestDatabase, testDatabaseUrl } from '../helpers/test-app';

const PREFIX = 'slotcore';
const id = (name: string) => `${PREFIX}-${name}`;
const NOW = new Date('2031-03-01T12:00:00Z');
/** Local midnight in the network's zone (UTC−1) is 01:00 UTC. */
const NIGHTS = ['2031-03-09', '2031-03-10', '2031-03-11', '2031-03-12', '2031-03-13'];
const startOf = (night: string) => `${night}T01:00:00.000Z`;

let db: Db;
let pool: pg.Pool;
let first: GroupSlots;

function request(overrides: Partial<Record<string, unknown>> = {}): SlotSearchRequest {
  return slotSearchCreateSchema.parse({
    sites: [id('X')], durationHours: 4, from: '2031-03-08T12:00:00Z', to: '2031-03-13T12:00:00Z',
    hours: { start: '00:00', end: '04:00' }, ...overrides,
  });
}

async function removeOwnRows(): Promise<void> {
  await db.delete(freezes).where(like(freezes.id, `${PREFIX}-%`));
  await db.delete(windows).where(like(windows.id, `${PREFIX}-%`));
  await db.delete(slices).where(like(slices.id, `${PREFIX}-%`));
  await db.delete(spans).where(like(spans.id, `${PREFIX}-%`));
  await db.delete(sites).where(like(sites.id, `${PREFIX}-%`));
  await db.delete(tenants).where(like(tenants.id, `${PREFIX}-%`));
}

async function insertScenario(): Promise<void> {
  await db.insert(tenants).values([
    { id: id('t-blue'), name: 'Blue Light Services', noticeDays: 3 },
    { id: id('t-meter'), name: 'Meterco', noticeDays: 10 },
  ]);
  const site = (key: string, cpu: number) => ({ id: id(key), name: `Site ${key}`, kind: 'edge' as const, lat: 50, lon: 1, cpu, mtbfHours: 50_000 });
  await db.insert(sites).values([site('A', 1), site('X', 8), site('Y', 8), site('B', 1), site('Z', 1)]);
  await db.insert(spans).values([['ax', 'A', 'X'], ['xb', 'X', 'B'], ['ay', 'A', 'Y'], ['yb', 'Y', 'B'], ['bz', 'B', 'Z']].map(([k, a, b]) => ({
    id: id(k), siteA: id(a), siteB: id(b), capacityGbps: 10, lengthKm: 10, mtbfHours: 20_000,
  })));
  await db.insert(slices).values([
    { id: id('dispatch'), tenantId: id('t-blue'), name: 'Emergency dispatch', sst: 1, priority: 1, critical: true },
    { id: id('meter'), tenantId: id('t-meter'), name: 'Meter readings', sst: 3, priority: 4 },
    { id: id('relay'), tenantId: id('t-blue'), name: 'Alarm relay', sst: 1, priority: 1, critical: true },
  ]);
  await db.insert(sliceFunctions).values([
    { id: id('f1'), sliceId: id('dispatch'), cpu: 4 }, { id: id('f2'), sliceId: id('dispatch'), cpu: 1 },
    { id: id('g1'), sliceId: id('meter'), cpu: 2 }, { id: id('h1'), sliceId: id('relay'), cpu: 0.5, fixed: true },
  ]);
  await db.insert(sliceTies).values([
    { id: id('e1'), sliceId: id('dispatch'), fromFunction: id('f1'), toFunction: id('f2'), bandwidthGbps: 1, maxLatencyMs: 50 },
  ]);
  await db.insert(placements).values([
    { sliceId: id('dispatch'), revision: 1, sites: { [id('f1')]: id('X'), [id('f2')]: id('A') }, paths: { [id('e1')]: [id('ax')] } },
    { sliceId: id('meter'), revision: 1, sites: { [id('g1')]: id('X') }, paths: {} },
    { sliceId: id('relay'), revision: 1, sites: { [id('h1')]: id('Z') }, paths: {} },
  ]);
  await db.insert(freezes).values({
    id: id('freeze'), title: 'Spring census freeze', startsAt: new Date('2031-03-08T23:00:00Z'), endsAt: new Date('2031-03-09T08:00:00Z'),
  });
  await db.insert(windows).values([
    { id: id('w-shared'), title: 'Rectifier swap at X', startsAt: new Date('2031-03-10T00:00:00Z'), endsAt: new Date('2031-03-10T08:00:00Z') },
    { id: id('w-reduce'), title: 'Cooling work at Y', startsAt: new Date('2031-03-12T00:00:00Z'), endsAt: new Date('2031-03-12T08:00:00Z') },
    { id: id('w-b'), title: 'Battery check at B and Z', startsAt: new Date('2031-03-14T00:00:00Z'), endsAt: new Date('2031-03-14T08:00:00Z') },
  ]);
  await db.insert(windowElements).values([
    { windowId: id('w-shared'), elementKind: 'site', elementId: id('X'), effect: 'down', fraction: null },
    { windowId: id('w-reduce'), elementKind: 'site', elementId: id('Y'), effect: 'reduced', fraction: 0.1 },
    { windowId: id('w-b'), elementKind: 'site', elementId: id('B'), effect: 'down', fraction: null },
    { windowId: id('w-b'), elementKind: 'site', elementId: id('Z'), effect: 'down', fraction: null },
  ]);
}

beforeAll(async () => {
  await useScratchDatabase('slotcore');
  await migrateTestDatabase();
  ({ db, pool } = createDb(testDatabaseUrl(), { max: 2 }));
  await removeOwnRows();
  await db.execute(sql`delete from policies`);
  await insertScenario();
  processRemapCache.clear();
  first = await findSlots(db, request(), { now: NOW });
});

afterAll(async () => {
  await removeOwnRows();
  await inventoryCacheFor(db).close();
  await pool.end();
});

const byNight = (result: GroupSlots) => new Map(result.candidates.map((c) => [c.start, c]));

test('the clean night ranks first; every other night is excluded with its reason', () => {
  expect(first.candidates.map((c) => c.start).sort()).toEqual(NIGHTS.map(startOf));
  // Each slot carries its night: the local day its 00:00–04:00 period begins on, as the campaign scheduler counts nights.
  expect(first.candidates.map((c) => c.night).sort()).toEqual([...NIGHTS]);
  const nights = byNight(first);
  const clean = nights.get(startOf(NIGHTS[4]))!;
  expect(clean).toMatchObject({ rank: 1, excluded: null, touched: 2, unresolved: 0, criticalTouched: 1, criticalUnresolved: 0 });
  expect(first.candidates[0]).toBe(clean);
  expect(first.candidates.filter((c) => c.rank !== null)).toHaveLength(1);
  expect(clean.explanation).toMatch(/Touches 2 slices \(1 critical\)/);
  expect(clean.counts).toEqual({ touched: 2, mustMove: 2, protectionLost: 0, unresolved: 0, knockOn: 0 });

  const freeze = nights.get(startOf(NIGHTS[0]))!;
  expect(freeze.excluded?.code).toBe('FREEZE');
  expect(freeze.excluded?.reason).toMatch(/"Spring census freeze" \(Sat, 8 Mar 2031, 22:00 – Sun, 9 Mar 2031, 07:00 GMT-1\)/);

  const conflict = nights.get(startOf(NIGHTS[1]))!;
  expect(conflict.excluded?.code).toBe('CONFLICT');
  expect(conflict.excluded?.reason).toBe('Conflicts with the window "Rectifier swap at X": both take out site Site X.');
  expect(conflict.conflicts.map((c) => c.id)).toEqual([id('w-shared')]);

  const lead = nights.get(startOf(NIGHTS[2]))!;
  expect(lead.excluded?.code).toBe('LEAD_TIME');
  expect(lead.excluded?.reason).toMatch(/^Meterco must be told 10 days ahead; only 9\.5 days are left/);
  expect(lead.noticeSpareDays).toBeLessThan(0);
  expect(lead.unresolved).toBeNull(); // excluded before the re-map

  const stranded = nights.get(startOf(NIGHTS[3]))!;
  expect(stranded.overlapping.map((w) => w.title)).toEqual(['Cooling work at Y']);
  expect(stranded.conflicts).toEqual([]);
  expect(stranded.excluded?.code).toBe('CRITICAL_STRANDED');
  expect(stranded.excluded?.reason).toBe('The quick re-map finds no place for the critical slice "Emergency dispatch".');
  expect(stranded.criticalUnresolved).toBe(1);

  expect(first.summary).toMatchObject({ usable: 1, excluded: 4 });
  expect(first.touchedSlices).toEqual([id('dispatch'), id('meter')].sort());
  for (const c of first.candidates) expect(c.explanation).not.toMatch(new RegExp(PREFIX));
});

test('a window at the same time that strands a slice on its own costs a little but does not exclude the night', async () => {
  const wider = await findSlots(db, request({ to: '2031-03-14T12:00:00Z' }), { now: NOW });
  const usable = wider.candidates.filter((c) => c.rank !== null);
  expect(usable.map((c) => [c.rank, c.start])).toEqual([[1, startOf(NIGHTS[4])], [2, '2031-03-14T01:00:00.000Z']]);
  const [clean, shared] = usable;
  expect(shared).toMatchObject({
    excluded: null, conflicts: [], overlapping: [{ id: id('w-b'), title: 'Battery check at B and Z' }], unresolved: 0, criticalUnresolved: 0,
  });
  expect(shared.cost).toBeGreaterThan(clean.cost);
  expect(shared.explanation).toMatch(/the window "Battery check at B and Z" also out/);
  expect(clean.explanation).not.toMatch(/also out/);
  // The excluded nights follow the usable ones, by start.
  expect(wider.candidates.slice(2).map((c) => c.start)).toEqual(NIGHTS.slice(0, 4).map(startOf));
});

test('a second search on the same network state reuses the quick re-map and gives the same answers', async () => {
  expect(first.summary.remapRuns).toBeGreaterThan(0);
  const again = await findSlots(db, request(), { now: NOW });
  expect(again.summary.remapRuns).toBe(0);
  expect(again.summary.reusedRuns).toBeGreaterThan(0);
  const strip = (r: GroupSlots) => r.candidates.map(({ reused: _reused, explanation: _e, ...rest }) => rest);
  expect(strip(again)).toEqual(strip(first));
  expect(again.candidates.filter((c) => c.unresolved !== null).every((c) => c.reused)).toBe(true);
});

test('with a thread remapper the search ranks the same, its re-maps run in the thread, and the thread is closed', async () => {
  processRemapCache.clear();
  const made: QuickRemapper[] = [];
  let remaps = 0;
  let closed = 0;
  const threaded = await findSlots(db, request(), {
    now: NOW,
    remapper: (scenario, inventory) => {
      const inner = threadRemapper(scenario, inventory);
      const spy: QuickRemapper = {
        remap: (req, onBusy) => { remaps += 1; return inner.remap(req, onBusy); },
        close: () => { closed += 1; return inner.close(); },
      };
      made.push(spy);
      return spy;
    },
  });
  expect(made).toHaveLength(1);
  expect(closed).toBe(1);
  expect(remaps).toBe(threaded.summary.remapRuns);
  expect(threaded.summary.remapRuns).toBe(first.summary.remapRuns);
  const strip = (r: GroupSlots) => r.candidates.map(({ explanation: _e, ...rest }) => rest);
  expect(strip(threaded)).toEqual(strip(first));
  await expect(made[0].remap({} as never)).rejects.toThrow('the quick re-map thread is closed');
});

test('progress ends with every candidate done; an aborted search stops early', async () => {
  const seen: SearchProgress[] = [];
  await findSlots(db, request(), { now: NOW, onProgress: (p) => { seen.push(p); } });
  expect(seen[0].phase).toBe('preparing');
  expect(seen[seen.length - 1]).toMatchObject({ phase: 'finishing', done: 5, total: 5 });

  let checks = 0;
  const signal = { get aborted() { checks += 1; return checks > 2; } };
  const stopped = findSlots(db, request(), { now: NOW, signal });
  await expect(stopped).rejects.toBeInstanceOf(SlotSearchCancelledError);
  await expect(stopped).rejects.toMatchObject({ done: 2, total: 5 });
});

test('several groups share one context; each is ranked on its own', async () => {
  const [x, b] = await findSlotsForGroups(db, request(), [{ sites: [id('X')], spans: [] }, { sites: [id('B')], spans: [] }], { now: NOW });
  expect(x.candidates.map((c) => [c.start, c.excluded?.code ?? null])).toEqual(first.candidates.map((c) => [c.start, c.excluded?.code ?? null]));
  // B hosts nothing and no slice crosses it; it only leaves the dispatch tie over ax without a backup path. On
  // night 2 the other window has X out at the same time: Meter readings must move because of that window, not of
  // B's work, so Meterco's 10 days' notice is that window's business and the night stays usable.
  expect(b.candidates.filter((c) => c.excluded).map((c) => [c.start, c.excluded!.code])).toEqual([[startOf(NIGHTS[0]), 'FREEZE']]);
  expect(b.candidates.find((c) => c.start === startOf(NIGHTS[1]))).toMatchObject({
    excluded: null, touched: 1, unresolved: 0, conflicts: [], overlapping: [{ id: id('w-shared'), title: 'Rectifier swap at X' }],
  });
  expect(b.candidates.find((c) => c.start === startOf(NIGHTS[4]))).toMatchObject({
    touched: 1, unresolved: 0, noticeSpareDays: 4.5, // Blue Light Services is owed the policy's 7 days
    counts: { touched: 1, mustMove: 0, protectionLost: 1, unresolved: 0, knockOn: 0 },
  });
  expect(b.touchedSlices).toEqual([id('dispatch')]);
});

test('a request the finder cannot search is refused before it starts, naming the problem', async () => {
  await expect(checkSlotRequest(db, request({ sites: [id('X'), 'no-such-site'] }))).rejects.toThrow(
    new SlotRequestError(['These sites or spans do not exist: no-such-site.']));
  await expect(checkSlotRequest(db, request({ sites: [], spans: [id('Y')] }))).rejects.toThrow(/Site Y is a site, not a span/);
  await expect(checkSlotRequest(db, request({ durationHours: 5 }))).rejects.toThrow(/5 hours of work do not fit/);
  await expect(checkSlotRequest(db, request({ durationHours: 13, hours: { start: '00:00', end: '00:00' } })))
    .rejects.toThrow(/a window may last at most 12 hours/);
  await expect(checkSlotRequest(db, request())).resolves.toEqual([{ kind: 'site', id: id('X'), name: 'Site X' }]);
});

test('elementsClash says why two groups must not be out together', async () => {
  const { scenario, inventory } = await currentInventory(db);
  const names = namesOf(scenario);
  const x = { sites: [id('X')], spans: [] };
  expect(elementsClash(inventory, x, { sites: [id('X')], spans: [id('yb')] }, names)).toEqual(['Both take out site Site X.']);
  // X alone or Y alone leaves A and B connected; both together cut them apart.
  expect(elementsClash(inventory, x, { sites: [id('Y')], spans: [] }, names))
    .toEqual([expect.stringMatching(/^Together they split the network into \d+ parts\.$/)]);
  expect(elementsClash(inventory, x, { sites: [id('B')], spans: [] }, names)).toEqual([]);
});

test('re-maps the safety cap stops are counted in the summary, and its words say the ranking may differ', async () => {
  processRemapCache.clear();
  // A clock that jumps past any cap at every reading: every re-map ends by time.
  let t = 0;
  const capped = await findSlots(db, request(), {
    now: NOW,
    remapper: (scenario, inventory) => ({
      remap: (req, onBusy) => quickRemap(scenario, inventory, req, onBusy, () => (t += 60_000)),
      close: async () => undefined,
    }),
  });
  processRemapCache.clear();
  expect(capped.summary.remapRuns).toBeGreaterThan(0);
  expect(capped.summary.remapsCutShort).toBe(capped.summary.remapRuns);
  const n = capped.summary.remapsCutShort;
  expect(summaryText(capped.summary)).toContain(
    `${n === 1 ? '1 re-map' : `${n} re-maps`} hit the time cap of ${capped.summary.remapLimitMs} ms`);
  // Without a cut-short re-map the summary says nothing of the cap.
  expect(first.summary.remapsCutShort).toBe(0);
  expect(summaryText(first.summary)).not.toMatch(/time cap/);
});
