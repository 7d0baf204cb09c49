// The verifier's own capacity, load, tolerance and anchor code: worked cases, an outside check value, and agreement
// with the planner's separate implementation on random instances (two independent codes agreeing).
import fc from 'fast-check';
import { satisfiesAnchor } from '../../../planner/model/anchor';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import type { Reservation, SlicePlacement } from '../../../planner/model/types';
import { addPlacementLoad, placementLoad, windowCapacity } from '../../../planner/model/window-capacity';
import { anchorHolds, haversineKm } from '../../../planner/verify/anchor-holds';
import { withinCapacity } from '../../../planner/verify/check-capacity';
import { tallyLoad } from '../../../planner/verify/load-tally';
import type { Violation } from '../../../planner/verify/violation';
import { windowLimits } from '../../../planner/verify/window-limits';
import { randomScenario } from '../fixtures/random-scenario';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

const inv = buildInventory(tinyScenario());
const site = (id: string) => inv.network.siteIndex.get(id)!;
const span = (id: string) => inv.network.spanIndex.get(id)!;
const limitsOf = (w = window('w', {}), reservations?: Reservation, out: Violation[] = []) =>
  windowLimits(inv, compileWindow(w), reservations, out);

describe('windowLimits', () => {
  it('zeroes and flags a down site and every span touching it', () => {
    const limits = limitsOf(window('w', { sites: ['B'] }));
    expect(limits.siteCpu[site('B')]).toBe(0);
    expect(inv.network.spans.filter((_, i) => limits.spanDown[i]).map((s) => s.id)).toEqual(['ab', 'bd']);
    expect(limits.spanGbps[span('ab')]).toBe(0);
    expect(limits.spanGbps[span('cd')]).toBe(20);
  });

  it('scales reduced elements (the harsher of two cuts) and subtracts reservations, never below zero', () => {
    const w = window('w', {}, [{ span: 'bd', fraction: 0.5 }, { span: 'bd', fraction: 0.25 }, { site: 'A', fraction: 0.5 }]);
    const limits = limitsOf(w, { siteCpu: { A: 10, E: 99 }, spanGbps: { bd: 1 } });
    expect(limits.spanGbps[span('bd')]).toBeCloseTo(4, 12);
    expect(limits.siteCpu[site('A')]).toBeCloseTo(40, 12);
    expect(limits.siteCpu[site('E')]).toBe(0);
    expect(limits.spanDown[span('bd')]).toBe(0);
  });

  it('reports a reservation on an unknown element as unknown-element instead of throwing', () => {
    const out: Violation[] = [];
    limitsOf(window('w', {}), { siteCpu: { Z: 1 }, spanGbps: { zz: 1 } }, out);
    expect(out.map((v) => v.code)).toEqual(['unknown-element', 'unknown-element']);
  });
});

describe('tallyLoad', () => {
  it('counts entries at their planned placement, others at their current one, and nothing for a null entry', () => {
    const hosted = inv.sliceIndex.get('s-hosted')!;
    const transit = inv.sliceIndex.get('s-transit')!;
    const moved: SlicePlacement = { sites: [site('C'), site('A')], paths: [[span('ac')]] };
    const load = tallyLoad(inv, new Map([[hosted, moved], [transit, null]]));
    expect(load.siteCpu[site('B')]).toBe(0);
    expect(load.siteCpu[site('C')]).toBe(4 + 3);
    expect(load.spanGbps[span('ac')]).toBe(2);
    expect(load.spanGbps[span('de')]).toBe(0);
    expect(load.spanGbps[span('cd')]).toBe(1);
  });

  it('claims a span once per crossing when a path repeats it', () => {
    const hosted = inv.sliceIndex.get('s-hosted')!;
    const detour: SlicePlacement = { sites: [site('B'), site('A')], paths: [[span('ab'), span('ab'), span('ab')]] };
    expect(tallyLoad(inv, new Map([[hosted, detour]])).spanGbps[span('ab')]).toBe(3 * 2 + 5);
  });
});

describe('withinCapacity', () => {
  it('allows a relative slack of 1e-9 of the capacity (absolute 1e-9 below capacity 1)', () => {
    expect(withinCapacity(100 + 0.9e-7, 100)).toBe(true);
    expect(withinCapacity(100 + 1.1e-7, 100)).toBe(false);
    expect(withinCapacity(0.9e-9, 0)).toBe(true);
    expect(withinCapacity(1.1e-9, 0)).toBe(false);
  });
});

describe('anchorHolds and haversineKm', () => {
  it('matches the LAX → JFK great-circle distance', () => {
    // Ed Williams' Aviation Formulary worked example (secondary, see REFERENCES.md): LAX (33°57′N, 118°24′W) to
    // JFK (40°38′N, 73°47′W) is 0.623585 rad, 3972.86 km with mean Earth radius 6371.0088 km.
    const lax = { lat: 33 + 57 / 60, lon: -(118 + 24 / 60) };
    const jfk = { lat: 40 + 38 / 60, lon: -(73 + 47 / 60) };
    expect(haversineKm(lax, jfk)).toBeCloseTo(3972.86, 1);
  });

  it('gives R·Δφ along a meridian and never NaN for antipodes', () => {
    expect(haversineKm({ lat: 10, lon: 5 }, { lat: 12, lon: 5 })).toBeCloseTo((6371.0088 * 2 * Math.PI) / 180, 9);
    expect(haversineKm({ lat: 0, lon: 0 }, { lat: 0, lon: 180 })).toBeCloseTo(6371.0088 * Math.PI, 6);
  });

  it('accepts any site without anchor, only that site for a site anchor, and sites within a point radius', () => {
    expect(anchorHolds(inv.network, undefined, site('E'))).toBe(true);
    expect(anchorHolds(inv.network, { site: site('A') }, site('A'))).toBe(true);
    expect(anchorHolds(inv.network, { site: site('A') }, site('B'))).toBe(false);
    // From A (50.0, 10.0): C (49.9, 10.0) is 0.1° of meridian, about 11.12 km; B (50.0, 10.2) about 14.3 km.
    expect(anchorHolds(inv.network, { lat: 50, lon: 10, radiusKm: 12 }, site('C'))).toBe(true);
    expect(anchorHolds(inv.network, { lat: 50, lon: 10, radiusKm: 12 }, site('B'))).toBe(false);
  });
});

describe('the verifier and the planner account alike', () => {
  const arb = fc.record({ seed: fc.integer({ min: 1, max: 1_000_000 }), reserveShare: fc.double({ min: 0, max: 1.5, noNaN: true }) });

  it('window limits, loads and anchors agree with the planner code on random instances', () => {
    fc.assert(fc.property(arb, ({ seed, reserveShare }) => {
      const { scenario, window: w } = randomScenario(seed, { sites: 8, extraSpans: 5, slices: 8 });
      const rInv = buildInventory(scenario);
      const reservations: Reservation = {
        siteCpu: Object.fromEntries(scenario.sites.filter((_, i) => i % 2 === 0).map((s) => [s.id, s.cpu * reserveShare])),
        spanGbps: Object.fromEntries(scenario.spans.filter((_, i) => i % 3 === 0).map((s) => [s.id, s.capacityGbps * reserveShare])),
      };
      const spec = compileWindow(w);
      const mine = windowLimits(rInv, spec, reservations, []);
      const theirs = windowCapacity(rInv, spec, reservations);
      expect(mine).toEqual(theirs);
      // Half the slices at their current placement, the other half "planned" at it too, one dropped as unresolved.
      const planned = new Map<number, SlicePlacement | null>(rInv.slices.filter((s) => s.index % 2 === 1).map((s) => [s.index, rInv.placements[s.index]]));
      planned.set(0, null);
      const rest = rInv.slices.map((s) => s.index).filter((s) => !planned.has(s));
      const load = placementLoad(rInv, rest);
      for (const [s, p] of planned) if (p) addPlacementLoad(rInv, s, p, load);
      expect(tallyLoad(rInv, planned)).toEqual(load);
      const point = { lat: 50, lon: 11, radiusKm: 150 };
      rInv.network.sites.forEach((_, i) => expect(anchorHolds(rInv.network, point, i)).toBe(satisfiesAnchor(rInv.network, point, i)));
    }), { numRuns: 200, seed: 0x5eed01 });
  });
});
