import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { placementLoad, windowCapacity } from '../../../planner/model/window-capacity';
import { satisfiesAnchor } from '../../../planner/model/anchor';
import { UnknownElementError } from '../../../planner/errors';
import { tinyScenario, window } from '../fixtures/tiny-scenario';

const inv = buildInventory(tinyScenario());
const site = (id: string) => inv.network.siteIndex.get(id)!;
const span = (id: string) => inv.network.spanIndex.get(id)!;

describe('windowCapacity', () => {
  it('zeroes and flags a down site and every span touching it', () => {
    const cap = windowCapacity(inv, compileWindow(window('w', { sites: ['B'] })));
    expect(cap.siteDown[site('B')]).toBe(1);
    expect(cap.siteCpu[site('B')]).toBe(0);
    expect([...cap.spanDown].map((d, i) => (d ? inv.network.spans[i].id : '')).filter(Boolean)).toEqual(['ab', 'bd']);
    expect(cap.spanGbps[span('ab')]).toBe(0);
    expect(cap.spanGbps[span('cd')]).toBe(20);
  });

  it('scales reduced elements and subtracts reservations, never below zero', () => {
    const w = compileWindow(window('w', {}, [{ span: 'bd', fraction: 0.25 }, { site: 'A', fraction: 0.5 }]));
    const cap = windowCapacity(inv, w, { siteCpu: { A: 10, E: 99 }, spanGbps: { bd: 1 } });
    expect(cap.spanGbps[span('bd')]).toBeCloseTo(4, 12);
    expect(cap.siteCpu[site('A')]).toBeCloseTo(40, 12);
    expect(cap.siteCpu[site('E')]).toBe(0);
    expect(cap.spanDown[span('bd')]).toBe(0);
  });

  it('throws UnknownElementError for unknown window elements', () => {
    expect(() => windowCapacity(inv, compileWindow(window('w', { spans: ['nope'] })))).toThrow(UnknownElementError);
  });
});

describe('placementLoad', () => {
  it('sums current cpu per site and bandwidth per span of the given slices', () => {
    const load = placementLoad(inv, [inv.sliceIndex.get('s-hosted')!, inv.sliceIndex.get('s-transit')!]);
    expect(load.siteCpu[site('A')]).toBe(8);
    expect(load.siteCpu[site('B')]).toBe(4);
    expect(load.spanGbps[span('ab')]).toBe(7);
    expect(load.spanGbps[span('bd')]).toBe(5);
    expect(load.spanGbps[span('cd')]).toBe(0);
  });
});

describe('satisfiesAnchor', () => {
  it('accepts any site without anchor, only the site for a site anchor, and sites within the radius', () => {
    expect(satisfiesAnchor(inv.network, undefined, site('E'))).toBe(true);
    expect(satisfiesAnchor(inv.network, { site: site('A') }, site('A'))).toBe(true);
    expect(satisfiesAnchor(inv.network, { site: site('A') }, site('B'))).toBe(false);
    // A (50.0, 10.0) to B (50.0, 10.2) is about 14.3 km; C (49.9, 10.0) about 11.1 km.
    const point = { lat: 50.0, lon: 10.0, radiusKm: 12 };
    expect(satisfiesAnchor(inv.network, point, site('C'))).toBe(true);
    expect(satisfiesAnchor(inv.network, point, site('B'))).toBe(false);
  });
});
