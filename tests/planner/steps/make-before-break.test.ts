import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { orderSteps } from '../../../planner/steps/make-before-break';
import type { Inventory, SlicePlacement } from '../../../planner/model/types';
import { scenarioWith, tinyNetwork, window, type SliceSpec } from '../fixtures/tiny-scenario';

const quiet = compileWindow(window('w-nothing', {}));

/** Tiny network with B and C shrunk to 4 vCPU each, so single moves can block each other. */
function tightInventory(specs: SliceSpec[]): Inventory {
  const net = tinyNetwork();
  net.sites = net.sites.map((s) => (s.id === 'B' || s.id === 'C' ? { ...s, cpu: 4 } : s));
  return buildInventory(scenarioWith(specs, net));
}

function moveTo(inv: Inventory, moves: Record<string, string[]>): Map<number, SlicePlacement | null> {
  return new Map(Object.entries(moves).map(([slice, sites]) => [
    inv.sliceIndex.get(slice)!,
    { sites: sites.map((id) => inv.network.siteIndex.get(id)!), paths: [] },
  ]));
}

describe('orderSteps', () => {
  it('flags a two-move swap that only works with spare capacity', () => {
    const inv = tightInventory([
      { id: 's1', functions: { x: ['B', 4] }, ties: [] },
      { id: 's2', functions: { y: ['C', 4] }, ties: [] },
    ]);
    const order = orderSteps(inv, quiet, moveTo(inv, { s1: ['C'], s2: ['B'] }));
    expect(order.steps.map((s) => [s.element, s.from, s.to, s.needsSpare])).toEqual([
      ['x', 'B', 'C', true],
      ['y', 'C', 'B', false],
    ]);
    expect(order.needsSpare).toBe(1);
  });

  it('orders independent moves so each fits: the one that frees room goes first', () => {
    const inv = tightInventory([
      { id: 's1', functions: { y: ['D', 4] }, ties: [] },
      { id: 's2', functions: { x: ['B', 4] }, ties: [] },
    ]);
    const order = orderSteps(inv, quiet, moveTo(inv, { s1: ['B'], s2: ['C'] }));
    expect(order.steps.map((s) => s.element)).toEqual(['x', 'y']);
    expect(order.needsSpare).toBe(0);
  });

  it('claims spans shared by the old and new path once (shared-explicit make-before-break)', () => {
    // 8 Gbit/s on de (10 Gbit/s) would need 16 if counted twice.
    const inv = buildInventory(scenarioWith([
      { id: 's1', functions: { a: ['A', 1], e: ['E', 1] }, ties: [['a-e', 'a', 'e', 8, 5, ['ab', 'bd', 'de']]] },
    ]));
    const span = (id: string) => inv.network.spanIndex.get(id)!;
    const next = new Map([[0, { sites: inv.placements[0].sites, paths: [[span('ac'), span('cd'), span('de')]] }]]);
    const order = orderSteps(inv, quiet, next);
    expect(order.steps).toEqual([{
      slice: 's1', kind: 'reroute-tie', element: 'a-e', from: ['ab', 'bd', 'de'], to: ['ac', 'cd', 'de'], needsSpare: false, knockOn: false,
    }]);
    // a reservation on cd leaves too little room for the new path
    expect(orderSteps(inv, quiet, next, { spanGbps: { cd: 15 } }).needsSpare).toBe(1);
  });

  it('gives no steps for unresolved or unchanged slices', () => {
    const inv = tightInventory([{ id: 's1', functions: { x: ['B', 4] }, ties: [] }]);
    expect(orderSteps(inv, quiet, new Map([[0, null]])).steps).toEqual([]);
    expect(orderSteps(inv, quiet, new Map([[0, inv.placements[0]]])).steps).toEqual([]);
  });
});
