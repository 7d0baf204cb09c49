// planWindow on small hand-built scenarios (invented data): moves, reroutes, fixed functions, anchors,
// priorities, determinism and the options' plumbing. Every result is checked with verifyPlan.
import { InvalidOptionError } from '../../../planner/errors';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { Inventory, PlanResult } from '../../../planner/model/types';
import { planWindow, type PlanOptions } from '../../../planner/remap/plan-window';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import type { Scenario } from '../../../shared/scenario';
import { scenarioWith, tinyScenario, window } from '../fixtures/tiny-scenario';

async function plan(sc: Scenario, windowId: string, opts: Partial<PlanOptions> = {}): Promise<{ inv: Inventory; r: PlanResult }> {
  const inv = buildInventory(sc);
  const w = compileWindow(sc.windows!.find((x) => x.id === windowId)!);
  const r = await planWindow(inv, w, { generations: 40, population: 12, ...opts });
  const verdict = verifyPlan(inv, w, { affected: r.affected, slices: r.slices });
  expect(verdict.violations).toEqual([]);
  return { inv, r };
}

const entry = (r: PlanResult, slice: string) => r.slices.find((s) => s.slice === slice)!;

describe('planWindow on the tiny square network', () => {
  it.each(['serial', 'greedy'] as const)('%s: moves a function off a site going down to a usable site', async (mode) => {
    const { r } = await plan(tinyScenario(), 'w-site-b', { mode });
    const hosted = entry(r, 's-hosted');
    expect(hosted.outcome).toBe('move');
    expect(hosted.sites.gw).not.toBe('B');
    expect(r.objective.unresolved).toBe(0);
  });

  it.each(['serial', 'greedy'] as const)('%s: a down span causes reroutes, not moves', async (mode) => {
    const { r } = await plan(tinyScenario(), 'w-span-ab', { mode });
    expect(r.slices.map((s) => s.outcome)).toEqual(['reroute', 'reroute']);
    for (const s of r.slices) for (const path of Object.values(s.paths)) expect(path).not.toContain('ab');
    expect(r.objective.moved).toBe(0);
  });

  it('leaves a slice whose fixed function sits on a down site unresolved, with the reason', async () => {
    const sc = tinyScenario();
    sc.windows!.push(window('w-site-e', { sites: ['E'] }));
    const { r } = await plan(sc, 'w-site-e');
    const transit = entry(r, 's-transit');
    expect(transit.outcome).toBe('unresolved');
    expect(transit.reason).toMatch(/function "ran" is fixed to site Site E, which is down/);
    expect(r.objective.unresolvedWeight).toBe(5);
  });

  it('honours a point anchor: the only site within the radius wins over closer-to-the-peer sites', async () => {
    const sc = scenarioWith([{ id: 's-anchored', functions: { gw: ['B', 4], app: ['A', 2] }, ties: [['t', 'gw', 'app', 2, 1, ['ab']]] }]);
    sc.slices[0].functions[0].anchor = { lat: 49.9, lon: 10.0, radiusKm: 5 }; // only site C is within 5 km
    sc.windows = [window('w-b', { sites: ['B'] })];
    const { r } = await plan(sc, 'w-b');
    expect(entry(r, 's-anchored').sites.gw).toBe('C');
    delete sc.slices[0].functions[0].anchor;
    const { r: free } = await plan(sc, 'w-b');
    expect(entry(free, 's-anchored').sites.gw).toBe('A'); // unanchored, it joins its peer (no tie latency)
  });

  it('DE finds the joint move greedy misses (both functions onto the isolated leaf)', async () => {
    const { r: greedy } = await plan(tinyScenario(), 'w-site-d', { mode: 'greedy' });
    const { r: de } = await plan(tinyScenario(), 'w-site-d', { mode: 'serial' });
    expect(entry(greedy, 's-transit').outcome).toBe('unresolved');
    expect(entry(de, 's-transit').sites).toEqual({ ran: 'E', upf: 'E' });
    expect(de.objective.unresolvedWeight).toBeLessThan(greedy.objective.unresolvedWeight);
  });
});

describe('priority weighting when capacity is short', () => {
  // B goes down; A has room for one of the two 8-vCPU functions only.
  const net = {
    sites: [
      { id: 'A', name: 'A', kind: 'core' as const, lat: 50, lon: 10, cpu: 10 },
      { id: 'B', name: 'B', kind: 'edge' as const, lat: 50, lon: 10.1, cpu: 20 },
    ],
    spans: [{ id: 'ab', a: 'A', b: 'B', capacityGbps: 10, lengthKm: 7 }],
  };
  const sc = scenarioWith([
    { id: 'low', priority: 5, functions: { f: ['B', 8] }, ties: [] },
    { id: 'high', priority: 1, functions: { f: ['B', 8] }, ties: [] },
  ], net, [window('w-b', { sites: ['B'] })]);

  it.each(['serial', 'greedy'] as const)('%s leaves the lower-priority slice unresolved', async (mode) => {
    const { r } = await plan(sc, 'w-b', { mode });
    expect(entry(r, 'high').outcome).toBe('move');
    expect(entry(r, 'low').outcome).toBe('unresolved');
    expect(entry(r, 'low').reason).toMatch(/vCPU/);
    expect(r.objective.unresolvedWeight).toBe(1);
  });
});

describe('options and plumbing', () => {
  it('serial DE is deterministic for a seed', async () => {
    const a = await plan(tinyScenario(), 'w-site-b', { seed: 42 });
    const b = await plan(tinyScenario(), 'w-site-b', { seed: 42 });
    expect(b.r.slices).toEqual(a.r.slices);
    expect(b.r.trace).toEqual(a.r.trace);
  });

  it('reports progress, stops on the stall limit and on the time limit of the injected clock', async () => {
    const seen: number[] = [];
    const stalled = await plan(tinyScenario(), 'w-span-ab', { generations: 500, stallGenerations: 7, onProgress: (p) => seen.push(p.generation) });
    expect(stalled.r.trace.length).toBe(8);
    expect(seen).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    let t = 0;
    const timed = await plan(tinyScenario(), 'w-span-ab', { generations: 500, stallGenerations: 500, timeLimitMs: 50, now: () => (t += 5) });
    expect(timed.r.trace.length).toBeLessThan(20);
  });

  it('says why the search stopped, and a run bounded by counts gives the same plan at any clock speed', async () => {
    const stalled = await plan(tinyScenario(), 'w-span-ab', { generations: 500, stallGenerations: 7 });
    expect(stalled.r).toMatchObject({ stoppedBy: 'stall', generations: 7 });
    const counted = (step: number) => {
      let t = 0;
      return plan(tinyScenario(), 'w-span-ab', {
        generations: 6, stallGenerations: 500, polishEvaluations: 30, timeLimitMs: 1e6, now: () => (t += step),
      });
    };
    const [fast, slow] = [await counted(1), await counted(3)];
    expect(fast.r).toMatchObject({ stoppedBy: 'generations', generations: 6 });
    expect(slow.r.slices).toEqual(fast.r.slices);
    expect(slow.r.trace).toEqual(fast.r.trace);
    // The same run with its clock past the limit at every reading ends by time.
    let t = 0;
    const timed = await plan(tinyScenario(), 'w-span-ab', { generations: 500, stallGenerations: 500, timeLimitMs: 50, now: () => (t += 100) });
    expect(timed.r.stoppedBy).toBe('time');
    // Greedy does not search: no stop reason.
    expect((await plan(tinyScenario(), 'w-span-ab', { mode: 'greedy' })).r.stoppedBy).toBeUndefined();
  });

  it('rejects unknown modes and parallel modes without a runner', async () => {
    const inv = buildInventory(tinyScenario());
    const w = compileWindow(tinyScenario().windows![1]);
    await expect(planWindow(inv, w, { mode: 'nonsense' as never })).rejects.toBeInstanceOf(InvalidOptionError);
    await expect(planWindow(inv, w, { mode: 'islands' })).rejects.toBeInstanceOf(InvalidOptionError);
  });

  it('returns an empty plan for a window that affects nothing', async () => {
    const { r } = await plan(tinyScenario(), 'w-nothing');
    expect(r.affected).toEqual([]);
    expect(r.slices).toEqual([]);
  });
});
