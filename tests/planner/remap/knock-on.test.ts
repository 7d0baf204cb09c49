// Knock-on moves, on a worked example built by hand (invented sites A–E of the tiny square network):
//   slice "t-link" joins fixed functions on A and B over span ab; the window takes ab down, so its only detour
//   is A–C–D–B. Span cd (20 Gbit/s) already carries 15 Gbit/s of the untouched slice "k-pair" (C ↔ D), leaving
//   5 Gbit/s, and t-link needs 10. Nothing else helps t-link: only moving k-pair off cd keeps it in service —
//   one of k-pair's functions can join its partner (C or D has room), so its tie needs no span at all.
import { exactPlan } from '../../../planner/exact/exact-plan';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { planWindow } from '../../../planner/remap/plan-window';
import { buildRemapProblem } from '../../../planner/remap/problem';
import { buildReview } from '../../../planner/review/build-review';
import { verifyPlan } from '../../../planner/verify/verify-plan';
import { scenarioWith, tinyNetwork, window } from '../fixtures/tiny-scenario';

const sc = scenarioWith([
  {
    id: 't-link', priority: 1, fixed: ['a', 'b'], functions: { a: ['A', 2], b: ['B', 2] },
    ties: [['a-b', 'a', 'b', 10, 5, ['ab']]],
  },
  { id: 'k-pair', priority: 3, functions: { c: ['C', 2], d: ['D', 2] }, ties: [['c-d', 'c', 'd', 15, 5, ['cd']]] },
], tinyNetwork(), [window('w-ab', { spans: ['ab'] })]);
const inv = buildInventory(sc);
const w = compileWindow(sc.windows![0]);
const none = { greedy: { solver: 'greedy' as const, objective: null, elapsedMs: 0, optimal: null, gap: null, bound: null, note: null }, exact: null, computeMs: 0 };

describe('knock-on moves: worked example', () => {
  it('without knock-on moves the touched slice must go dark (the exact optimum agrees)', async () => {
    const r = await planWindow(inv, w, { knockOn: false, seed: 1 });
    expect(r.affected).toEqual(['t-link']);
    expect(r.slices.map((s) => [s.slice, s.outcome])).toEqual([['t-link', 'unresolved']]);
    const exact = await exactPlan(buildRemapProblem(inv, w), { timeLimitMs: 10_000 });
    expect(exact.optimal).toBe(true);
    expect(exact.objective.unresolved).toBe(1);
  });

  it('with knock-on moves the untouched slice moves off the span and the touched one is rerouted', async () => {
    const r = await planWindow(inv, w, { seed: 1 });
    expect(r.search?.usedFallback).toBeNull();
    expect(r.search?.objective.unresolved).toBe(0);
    const byId = new Map(r.slices.map((s) => [s.slice, s]));
    expect(byId.get('t-link')).toMatchObject({ outcome: 'reroute', paths: { 'a-b': ['ac', 'cd', 'bd'] } });
    const k = byId.get('k-pair')!;
    expect(k).toMatchObject({ outcome: 'move', paths: { 'c-d': [] }, madeRoomFor: ['t-link'] });
    // Either function may join the other (same cost); both end on one site of the pair.
    expect(k.sites.c).toBe(k.sites.d);
    expect(['C', 'D']).toContain(k.sites.c);
    expect(byId.get('t-link')!.madeRoomFor).toBeUndefined();
    expect(r.affected).toEqual(['t-link']);
    expect(verifyPlan(inv, w, { affected: r.affected, slices: r.slices }).violations).toEqual([]);
    // Move cost paid for the knock-on move: k-pair's function c (2) and its tie (0.25), plus t-link's reroute (0.25).
    expect(r.objective.moveCost).toBeCloseTo(2.5, 9);
  });

  it('orders the knock-on move before the reroute it makes room for, both within capacity', async () => {
    const r = await planWindow(inv, w, { seed: 1 });
    const review = buildReview(inv, w, r, none);
    expect(review.steps.map((s) => [s.slice, s.kind, s.knockOn])).toEqual([
      ['k-pair', 'move-function', true], ['k-pair', 'reroute-tie', true], ['t-link', 'reroute-tie', false],
    ]);
    expect(review.steps.every((s) => !s.needsSpare)).toBe(true);
    expect(review.totals.knockOn).toBe(1);
    expect(review.slices.find((s) => s.slice === 'k-pair')!.madeRoomFor).toEqual([{ slice: 't-link', name: 't-link' }]);
  });

  it('honours the cap: with no knock-on move allowed the slice stays unresolved', async () => {
    const r = await planWindow(inv, w, { seed: 1, maxKnockOnMoves: 0 });
    expect(r.slices.map((s) => [s.slice, s.outcome])).toEqual([['t-link', 'unresolved']]);
  });

  it('the exact reference with knock-on candidates finds the same plan cost', async () => {
    const problem = buildRemapProblem(inv, w, { knockOn: { maxMoves: 5 } });
    expect(problem.slices.filter((b) => !b.touched).map((b) => inv.slices[b.slice].id)).toEqual(['k-pair']);
    const exact = await exactPlan(problem, { timeLimitMs: 10_000 });
    expect(exact.optimal).toBe(true);
    expect(exact.objective.unresolved).toBe(0);
    expect(exact.objective.moveCost).toBeCloseTo(2.5, 9);
  });
});
