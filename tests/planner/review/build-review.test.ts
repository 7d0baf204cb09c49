// buildReview: the review of a finished run matches the API schema and tells a consistent story
// (outcome ↔ moves/reroutes ↔ before/after ↔ steps ↔ totals), on the tiny network and on random scenarios.
import fc from 'fast-check';
import { randomWindow } from '../../../scenarios/generate/random-window';
import { buildScenario } from '../../../scenarios/generate/scenario-builder';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { Inventory, PlanResult, WindowSpec } from '../../../planner/model/types';
import { planWindow } from '../../../planner/remap/plan-window';
import { createRng } from '../../../planner/random/rng';
import { buildReview } from '../../../planner/review/build-review';
import { planReviewSchema, type PlanReview, type ReferenceResult } from '../../../shared/plans';
import type { Scenario } from '../../../shared/scenario';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

jest.setTimeout(120_000);

const greedyRef: ReferenceResult = { solver: 'greedy', objective: null, elapsedMs: 1, optimal: null, gap: null, bound: null, note: 'test' };

function review(inv: Inventory, w: WindowSpec, result: PlanResult, names?: Map<string, string>): PlanReview {
  return planReviewSchema.parse(buildReview(inv, w, result, { greedy: greedyRef, exact: null, computeMs: result.elapsedMs, names, reservedFor: ['w-other'] }));
}

/** Every invariant the review screen relies on. */
function expectConsistent(scenario: Scenario, r: PlanReview): void {
  const current = new Map(scenario.placements.map((p) => [p.slice, p]));
  // the affected slices, then any knock-on moves: untouched slices moved or rerouted to make room for affected ones
  const affected = new Set(r.affected);
  expect(r.slices.filter((s) => affected.has(s.slice)).map((s) => s.slice)).toEqual(r.affected);
  for (const s of r.slices.filter((x) => !affected.has(x.slice))) {
    expect(s.madeRoomFor.length).toBeGreaterThan(0);
    expect(['move', 'reroute']).toContain(s.outcome);
    for (const m of s.madeRoomFor) expect(affected.has(m.slice)).toBe(true);
  }
  expect(r.totals.knockOn).toBe(r.slices.filter((s) => s.madeRoomFor.length > 0).length);
  expect(r.steps.filter((x) => x.knockOn).map((x) => x.slice)).toEqual(
    r.steps.map((x) => x.slice).filter((id) => r.slices.find((s) => s.slice === id)!.madeRoomFor.length > 0));
  for (const s of r.slices) {
    expect(s.before).toEqual({ sites: current.get(s.slice)!.sites, paths: current.get(s.slice)!.paths });
    if (s.outcome === 'unresolved') {
      expect(s.after).toBeNull();
      expect(s.unresolvedReason).toEqual(expect.any(String));
      expect(s.moves).toEqual([]);
      expect(s.reroutes).toEqual([]);
      continue;
    }
    expect(s.unresolvedReason).toBeNull();
    expect(s.after).not.toBeNull();
    if (s.outcome === 'move') expect(s.moves.length).toBeGreaterThanOrEqual(1);
    if (s.outcome === 'reroute') expect([s.moves.length, s.reroutes.length >= 1]).toEqual([0, true]);
    if (s.outcome === 'stays') expect([s.moves, s.reroutes]).toEqual([[], []]);
    for (const m of s.moves) expect([m.from, m.to]).toEqual([s.before.sites[m.function], s.after!.sites[m.function]]);
    for (const t of s.reroutes) expect([t.from, t.to]).toEqual([s.before.paths[t.tie], s.after!.paths[t.tie]]);
    // make-before-break: every change has its step
    for (const m of s.moves) expect(r.steps).toContainEqual(expect.objectContaining({ slice: s.slice, kind: 'move-function', element: m.function, from: m.from, to: m.to }));
    for (const t of s.reroutes) expect(r.steps).toContainEqual(expect.objectContaining({ slice: s.slice, kind: 'reroute-tie', element: t.tie, from: t.from, to: t.to }));
  }
  const changes = r.slices.reduce((n, s) => n + s.moves.length + s.reroutes.length, 0);
  expect(r.steps).toHaveLength(changes);
  expect(r.needsSpare).toBe(r.steps.filter((s) => s.needsSpare).length);
  const t = r.totals;
  expect(t.stays + t.moved + t.rerouted + t.unresolved).toBe(r.slices.length);
  expect([t.moved, t.rerouted, t.unresolved, t.moveCost]).toEqual([r.objective.moved, r.objective.rerouted, r.objective.unresolved, r.objective.moveCost]);
  // risk: the affected slices still in service
  const inService = r.slices.filter((s) => s.outcome !== 'unresolved').map((s) => s.slice);
  expect(r.risk.map((x) => x.slice).sort()).toEqual([...inService].sort());
}

describe('buildReview on the tiny network', () => {
  const scenario = tinyScenario();
  const inv = buildInventory(scenario);

  it('B down: the hosted slice moves, the transit slice is rerouted; reasons, names and figures are carried over', async () => {
    const w = compileWindow(window('w-site-b', { sites: ['B'] }));
    const result = await planWindow(inv, w, { mode: 'serial', seed: 3, timeLimitMs: 5_000 });
    const r = review(inv, w, result, new Map([['s-hosted', 'Hosted slice']]));
    expectConsistent(scenario, r);
    const byId = new Map(r.slices.map((s) => [s.slice, s]));
    expect(byId.get('s-hosted')).toMatchObject({ name: 'Hosted slice', reasons: ['hosted', 'transit'], outcome: 'move', tenantId: 'tenant-alpha', priority: 2 });
    expect(byId.get('s-hosted')!.moves.map((m) => [m.function, m.from])).toEqual([['gw', 'B']]);
    expect(byId.get('s-transit')).toMatchObject({ name: 's-transit', reasons: ['transit'], outcome: 'reroute', critical: true, sst: 2 });
    expect(r.reservedFor).toEqual(['w-other']);
    expect(r.trace).toEqual(result.trace);
  });

  it('D down cuts the leaf E off: the slice with a fixed function on E is unresolved and says why', async () => {
    const w = compileWindow(window('w-site-d', { sites: ['D'] }));
    const result = await planWindow(inv, w, { mode: 'greedy' });
    const r = review(inv, w, result);
    expectConsistent(scenario, r);
    const transit = r.slices.find((s) => s.slice === 's-transit')!;
    expect(transit.outcome).toBe('unresolved');
    expect(transit.unresolvedReason).toMatch(/ran|path|E/);
    expect(r.risk.some((x) => x.slice === 's-transit')).toBe(false);
  });
});

describe('buildReview (property)', () => {
  it('on random scenarios and windows the review parses and is consistent', async () => {
    const arb = fc.record({ seed: fc.integer({ min: 1, max: 1_000_000 }), sites: fc.integer({ min: 5, max: 12 }), slices: fc.integer({ min: 3, max: 15 }) });
    await fc.assert(fc.asyncProperty(arb, async ({ seed, sites, slices }) => {
      const scenario = buildScenario({ sites, slices, seed, windows: 0 });
      const w = compileWindow(randomWindow(scenario, createRng(seed), 'w', { reducedShare: 0.3 }));
      const inv = buildInventory(scenario);
      expectConsistent(scenario, review(inv, w, await planWindow(inv, w, { mode: 'greedy' })));
    }), { numRuns: 25, seed: 777 });
  });
});
