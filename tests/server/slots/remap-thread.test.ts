// The slot search's quick re-maps in a worker thread (server/jobs/slot-remap-thread.ts): the same answers as on the
// calling thread, the event loop keeps turning while one computes, and errors and closing settle every request.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { overlapReservations } from '../../../planner/plan/overlap-reservations';
import { threadRemapper, withRemapThreads } from '../../../server/jobs/slot-remap-thread';
import type { SlotEngine } from '../../../server/services/campaigns/engine';
import { inProcessRemapper, type QuickRemapper, type RemapRequest, type RemapWindow } from '../../../server/services/slots/quick-remap';
import { QUICK_REMAP_GENERATIONS, QUICK_REMAP_POLISH_EVALUATIONS } from '../../../server/services/slots/evaluate-slot';
import { planSettingsSchema } from '../../../shared/plans';
import { scenarioSchema, type Scenario } from '../../../shared/scenario';
import { turnsWhile } from '../helpers/event-loop-turns';

/**
 * The slot finder's hand-built network (tests/server/slots/find-slots.test.ts):
 *   A ──ax── X ──xb── B ──bz── Z     X and Y have room for 8 vCPU each; A, B and Z for 1.
 *   └──ay── Y ──yb───┘               a critical slice on X and A tied over ax, a small one on X, a fixed one on Z.
 */
function handBuilt(): Scenario {
  const site = (key: string, cpu: number) => ({ id: key, name: `Site ${key}`, kind: 'edge' as const, lat: 50, lon: 1, cpu, mtbfHours: 50_000 });
  return scenarioSchema.parse({
    format: 'slackwater-scenario/1',
    sites: [site('A', 1), site('X', 8), site('Y', 8), site('B', 1), site('Z', 1)],
    spans: [['ax', 'A', 'X'], ['xb', 'X', 'B'], ['ay', 'A', 'Y'], ['yb', 'Y', 'B'], ['bz', 'B', 'Z']]
      .map(([id, a, b]) => ({ id, a, b, capacityGbps: 10, lengthKm: 10, mtbfHours: 20_000 })),
    tenants: [{ id: 't-blue', name: 'Blue Light Services', noticeDays: 3 }, { id: 't-meter', name: 'Meterco', noticeDays: 10 }],
    slices: [
      {
        id: 'dispatch', tenant: 't-blue', name: 'Emergency dispatch', sst: 1, priority: 1, critical: true,
        functions: [{ id: 'f1', cpu: 4 }, { id: 'f2', cpu: 1 }],
        ties: [{ id: 'e1', from: 'f1', to: 'f2', bandwidthGbps: 1, maxLatencyMs: 50 }],
      },
      { id: 'meter', tenant: 't-meter', name: 'Meter readings', sst: 3, priority: 4, functions: [{ id: 'g1', cpu: 2 }], ties: [] },
      { id: 'relay', tenant: 't-blue', name: 'Alarm relay', sst: 1, priority: 1, critical: true, functions: [{ id: 'h1', cpu: 0.5, fixed: true }], ties: [] },
    ],
    placements: [
      { slice: 'dispatch', sites: { f1: 'X', f2: 'A' }, paths: { e1: ['ax'] } },
      { slice: 'meter', sites: { g1: 'X' }, paths: {} },
      { slice: 'relay', sites: { h1: 'Z' }, paths: {} },
    ],
  });
}

const work = (down: RemapWindow['down'], hours = 4): RemapWindow => ({
  id: 'slot-candidate', start: new Date(0).toISOString(), end: new Date(hours * 3_600_000).toISOString(), down, reduced: [],
});

function request(window: RemapWindow, reservations: RemapRequest['reservations'] = {}, timeLimitMs = 300): RemapRequest {
  const d = planSettingsSchema.parse({});
  return {
    window, reservations,
    plan: {
      mode: d.mode, seed: d.seed, population: d.population, knockOn: d.knockOn, maxKnockOnMoves: d.maxKnockOnMoves, timeLimitMs,
      generations: QUICK_REMAP_GENERATIONS, polishEvaluations: QUICK_REMAP_POLISH_EVALUATIONS,
    },
  };
}

const open: QuickRemapper[] = [];
function remapperOn(kind: 'thread' | 'in-process', scenario: Scenario): QuickRemapper {
  const r = (kind === 'thread' ? threadRemapper : inProcessRemapper)(scenario, buildInventory(scenario));
  open.push(r);
  return r;
}
afterAll(async () => {
  await Promise.all(open.map((r) => r.close()));
});

test('the thread answers each network state as the calling thread does', async () => {
  const scenario = handBuilt();
  const inv = buildInventory(scenario);
  // Y cut to a tenth of its capacity by another window at the same time (the finder's night 4).
  const yReduced = overlapReservations(inv, [{
    window: compileWindow({ id: 'w-reduce', start: new Date(0).toISOString(), end: new Date(8 * 3_600_000).toISOString(),
      down: { sites: [], spans: [] }, reduced: [{ site: 'Y', fraction: 0.1 }] }),
    slices: [],
  }]);
  const states = [
    request(work({ sites: ['X'], spans: [] })),
    request(work({ sites: ['X'], spans: [] }), yReduced),
    request(work({ sites: [], spans: ['ax'] })),
    request(work({ sites: ['A'], spans: [] }, 2)),
  ];
  const local = remapperOn('in-process', scenario);
  const thread = remapperOn('thread', scenario);
  const busy: number[] = [];
  for (const [i, state] of states.entries()) {
    const mine = await local.remap(state);
    const theirs = await thread.remap(state, () => busy.push(i));
    expect(theirs.affected).toEqual(mine.affected);
    expect(theirs.slices).toEqual(mine.slices);
    expect(mine.affected.length).toBeGreaterThan(0);
  }
  // The states differ, so the comparison is not one answer four times.
  const answers = await Promise.all(states.map((s) => thread.remap(s)));
  expect(new Set(answers.map((a) => JSON.stringify(a.slices))).size).toBeGreaterThan(1);
  expect(answers.some((a) => a.slices.some((s) => s.outcome === 'unresolved'))).toBe(true);
});

describe('on a network big enough to keep the planner busy', () => {
  const demo = scenarioSchema.parse(JSON.parse(readFileSync(join(__dirname, '../../../scenarios/demo.json'), 'utf8')));
  const cores = demo.sites.filter((s) => s.kind === 'core').map((s) => s.id);
  const big = (n: number) => request(work({ sites: cores.slice(n, n + 2), spans: [] }), {}, 1_500);

  test('the event loop keeps turning while a thread re-map runs; on the calling thread it stalls', async () => {
    expect(cores.length).toBeGreaterThanOrEqual(3);
    const thread = remapperOn('thread', demo);
    await thread.remap(big(1)); // the thread's start-up (compiling the planner) is not what is measured
    let pings = 0;
    const inThread = await turnsWhile(() => thread.remap(big(0), () => { pings += 1; }));
    expect(inThread.value.affected.length).toBeGreaterThan(10);
    expect(inThread.turns).toBeGreaterThanOrEqual(10);
    expect(pings).toBeGreaterThan(0);

    const here = await turnsWhile(() => remapperOn('in-process', demo).remap(big(0)));
    expect(here.value.affected).toEqual(inThread.value.affected);
    expect(here.turns).toBeLessThanOrEqual(1);
  });

  test('closing the thread rejects a re-map still running and refuses new ones', async () => {
    const thread = remapperOn('thread', demo);
    const running = thread.remap(big(0));
    await new Promise((resolve) => setTimeout(resolve, 50));
    await thread.close();
    await expect(running).rejects.toThrow('the quick re-map thread was closed before it answered');
    await expect(thread.remap(big(0))).rejects.toThrow('the quick re-map thread is closed');
  });
});

test('a planner error rejects that request alone; the thread answers the next one', async () => {
  const thread = remapperOn('thread', handBuilt());
  const bad = request(work({ sites: ['X'], spans: [] }));
  bad.plan.population = 1;
  await expect(thread.remap(bad)).rejects.toThrow(/^the quick re-map failed: .*population/);
  const good = await thread.remap(request(work({ sites: ['X'], spans: [] })));
  expect(good.affected.length).toBeGreaterThan(0);
});

test('the slot jobs\' engine hands every search the thread remapper unless the caller chose one', async () => {
  const seen: unknown[] = [];
  const fake = {
    findSlots: async (_db: unknown, _req: unknown, opts: { remapper?: unknown }) => { seen.push(opts.remapper); return null; },
    findSlotsForGroups: async (_db: unknown, _t: unknown, _g: unknown, opts: { remapper?: unknown }) => { seen.push(opts.remapper); return []; },
  } as unknown as SlotEngine;
  const engine = withRemapThreads(fake);
  const now = new Date();
  await engine.findSlots(null as never, null as never, { now });
  await engine.findSlotsForGroups(null as never, null as never, [], { now });
  await engine.findSlots(null as never, null as never, { now, remapper: inProcessRemapper });
  expect(seen).toEqual([threadRemapper, threadRemapper, inProcessRemapper]);
});

test('a thread that dies rejects the requests it was given with the reason', async () => {
  // An inventory the thread cannot build (a placement on a site that does not exist) kills it as it starts.
  const broken = handBuilt();
  broken.placements[0] = { ...broken.placements[0], sites: { f1: 'nowhere', f2: 'A' } };
  const thread = threadRemapper(broken, buildInventory(handBuilt()));
  open.push(thread);
  const asked = [thread.remap(request(work({ sites: ['X'], spans: [] }))), thread.remap(request(work({ sites: ['A'], spans: [] })))];
  for (const answer of asked) await expect(answer).rejects.toThrow(/^the quick re-map thread crashed: .*nowhere/);
});
