// reservationsFor: accepted plans of OTHER active windows overlapping in time, against the real test database.
// The windows name elements of the planner's tiny network and the inventory is passed in, so the test does not
// depend on what other test files put in the shared network tables.
import { inArray } from 'drizzle-orm';
import { plans, windowElements, windows } from '../../../db/schema';
import { buildInventory } from '../../../planner/model/build-inventory';
import { reservationsFor } from '../../../server/services/plans/reservations';
import type { PlanSlice } from '../../../shared/plans';
import type { WindowStatus } from '../../../shared/windows';
import { tinyScenario } from '../../planner/fixtures/tiny-scenario';
import { setupTestApp, type TestContext } from '../helpers/test-app';

const HOUR_MS = 3_600_000;
const inv = buildInventory(tinyScenario());

let ctx: TestContext;
let base: number;
const created: string[] = [];

function view(slice: string, outcome: PlanSlice['outcome'], after: PlanSlice['after']): PlanSlice {
  return {
    slice, name: slice, tenantId: 'tenant-alpha', critical: false, priority: 3, sst: 1, reasons: ['hosted'], outcome,
    moves: [], reroutes: [], before: { sites: {}, paths: {} }, after, unresolvedReason: outcome === 'unresolved' ? 'no room' : null,
    madeRoomFor: [],
  };
}

/** B down; s-hosted's gw B → C over ac; s-transit rerouted de-cd-ac; an unresolved slice reserves nothing. */
const PLAN_SLICES: PlanSlice[] = [
  view('s-hosted', 'move', { sites: { gw: 'C', app: 'A' }, paths: { 'gw-app': ['ac'] } }),
  view('s-transit', 'reroute', { sites: { ran: 'E', upf: 'A' }, paths: { 'ran-upf': ['de', 'cd', 'ac'] } }),
  view('s-quiet', 'unresolved', null),
];

async function addWindow(key: string, o: {
  fromHours: number; toHours: number; status: WindowStatus; elements: [kind: 'site' | 'span', id: string, fraction?: number][]; accepted?: boolean;
}): Promise<string> {
  const id = `${ctx.prefix}-${key}`;
  created.push(id);
  await ctx.db.insert(windows).values({
    id, title: key, startsAt: new Date(base + o.fromHours * HOUR_MS), endsAt: new Date(base + o.toHours * HOUR_MS), status: o.status,
  });
  if (o.elements.length > 0) {
    await ctx.db.insert(windowElements).values(o.elements.map(([kind, elementId, fraction]) => ({
      windowId: id, elementKind: kind, elementId, effect: fraction === undefined ? 'down' as const : 'reduced' as const, fraction: fraction ?? null,
    })));
  }
  if (o.accepted) {
    const planId = `${id}-plan`;
    await ctx.db.insert(plans).values({
      id: planId, windowId: id, windowVersion: 1, status: 'done', settings: {}, result: { slices: PLAN_SLICES }, acceptedAt: new Date(),
    });
    await ctx.db.update(windows).set({ acceptedPlanId: planId }).where(inArray(windows.id, [id]));
  }
  return id;
}

beforeAll(async () => {
  ctx = await setupTestApp();
  // A random day centuries ahead: no other test file's windows overlap these.
  base = Date.UTC(2400, 0, 1) + Math.floor(Math.random() * 100_000) * 24 * HOUR_MS;
});

afterAll(async () => {
  if (created.length > 0) await ctx.db.delete(windows).where(inArray(windows.id, created));
  await ctx.close();
});

describe('reservationsFor', () => {
  it('reserves the accepted plans of other active overlapping windows only', async () => {
    const self = await addWindow('self', { fromHours: 0, toHours: 4, status: 'planned', elements: [['span', 'ab']], accepted: true });
    const overlapping = await addWindow('overlap', { fromHours: 2, toHours: 6, status: 'planned', elements: [['site', 'B']], accepted: true });
    const reduced = await addWindow('reduced', { fromHours: 3, toHours: 5, status: 'in-review', elements: [['span', 'bd', 0.2]], accepted: true });
    await addWindow('withdrawn', { fromHours: 1, toHours: 3, status: 'withdrawn', elements: [['site', 'A']], accepted: true });
    await addWindow('done', { fromHours: 1, toHours: 3, status: 'done', elements: [['site', 'A']], accepted: true });
    await addWindow('touching', { fromHours: 4, toHours: 8, status: 'planned', elements: [['site', 'A']], accepted: true });
    await addWindow('unplanned', { fromHours: 1, toHours: 3, status: 'assessed', elements: [['site', 'A']] });

    const r = await reservationsFor(ctx.db, self, inv);
    expect(r.reservedFor).toEqual([overlapping, reduced].sort());
    // Each accepted plan adds gw's 4 vCPU on C, 7 Gbit/s on ac and 5 on cd (twice: both plans store the same slices);
    // B is down in one window (50 vCPU, spans ab 40 and bd 20); bd's lost share (16) is below the down 20.
    expect(r.reservations.siteCpu).toEqual({ B: 50, C: 8 });
    expect(r.reservations.spanGbps).toEqual({ ab: 40, ac: 14, bd: 20, cd: 10 });
  });

  it('is empty when nothing overlaps, without needing the inventory', async () => {
    const lonely = await addWindow('lonely', { fromHours: 1000, toHours: 1004, status: 'assessed', elements: [['site', 'B']] });
    await expect(reservationsFor(ctx.db, lonely)).resolves.toEqual({ reservations: {}, reservedFor: [] });
  });

  it('refuses an unknown window', async () => {
    await expect(reservationsFor(ctx.db, `${ctx.prefix}-nope`, inv)).rejects.toMatchObject({ code: 'WINDOW_NOT_FOUND' });
  });
});
