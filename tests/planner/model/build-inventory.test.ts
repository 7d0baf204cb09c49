import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { InvalidScenarioError, UnknownElementError } from '../../../planner/errors';
import { scenarioWith, tinyNetwork, tinyScenario, window } from '../fixtures/tiny-scenario';

describe('buildInventory', () => {
  it('derives latency from length at 5 µs/km when latencyMs is missing', () => {
    // ITU-T G.114 (05/2003) Table A.1 (secondary): fibre 5 µs/km → a 100 km span is 0.5 ms.
    const net = tinyNetwork();
    net.spans[0] = { ...net.spans[0], lengthKm: 100, latencyMs: undefined };
    net.spans[1] = { ...net.spans[1], lengthKm: 100, latencyMs: 0.8 };
    const inv = buildInventory(scenarioWith([], net));
    expect(inv.network.spans[0].latencyMs).toBeCloseTo(0.5, 12);
    expect(inv.network.spans[1].latencyMs).toBe(0.8);
  });

  it('turns ids into indices and keeps graph and CSR arrays consistent', () => {
    const inv = buildInventory(tinyScenario());
    const { network } = inv;
    expect(network.graph.order).toBe(5);
    expect(network.graph.size).toBe(5);
    expect(network.graph.hasEdge('bd')).toBe(true);
    expect(network.graph.extremities('bd').sort()).toEqual(['B', 'D']);
    const d = network.siteIndex.get('D')!;
    const neighbours = [];
    for (let k = network.adjStart[d]; k < network.adjStart[d + 1]; k++) {
      neighbours.push([network.sites[network.adjSite[k]].id, network.spans[network.adjSpan[k]].id]);
    }
    expect(neighbours).toEqual([['B', 'bd'], ['C', 'cd'], ['E', 'de']]);
    const transit = inv.sliceIndex.get('s-transit')!;
    expect(inv.placements[transit].paths[0].map((s) => network.spans[s].id)).toEqual(['de', 'bd', 'ab']);
    expect(inv.slices[transit].functions[0].fixed).toBe(true);
    expect(inv.slices[transit].ties[0]).toMatchObject({ from: 0, to: 1, bandwidthGbps: 5 });
  });

  it('computes element availability from MTBF and MTTR', () => {
    const inv = buildInventory(tinyScenario());
    // common practice A = MTBF / (MTBF + MTTR) (REFERENCES.md)
    expect(inv.network.spans[0].availability).toBeCloseTo(20_000 / 20_008, 12);
    expect(inv.network.sites[0].mtbfHours).toBe(50_000);
  });

  it('throws UnknownElementError on dangling references', () => {
    const bad = tinyScenario();
    bad.spans.push({ id: 'zz', a: 'A', b: 'nowhere', capacityGbps: 1, lengthKm: 1 });
    expect(() => buildInventory(bad)).toThrow(UnknownElementError);
    const badPath = tinyScenario();
    badPath.placements[0].paths['gw-app'] = ['no-such-span'];
    expect(() => buildInventory(badPath)).toThrow(UnknownElementError);
    const badTenant = tinyScenario();
    badTenant.slices[0].tenant = 'ghost';
    expect(() => buildInventory(badTenant)).toThrow(UnknownElementError);
  });

  it('rejects duplicate ids and slices without placement', () => {
    const dup = tinyScenario();
    dup.sites.push({ ...dup.sites[0] });
    expect(() => buildInventory(dup)).toThrow(InvalidScenarioError);
    const missing = tinyScenario();
    missing.placements.pop();
    expect(() => buildInventory(missing)).toThrow(InvalidScenarioError);
  });
});

describe('compileWindow', () => {
  it('computes the duration in hours across time-zone offsets', () => {
    const w = { ...window('w', { sites: ['B'] }), start: '2030-03-01T01:00:00+02:00', end: '2030-03-01T01:30:00+00:00' };
    const spec = compileWindow(w);
    expect(spec.durationHours).toBeCloseTo(2.5, 12);
    expect(spec.downSites).toEqual(['B']);
    expect(spec.reduced).toEqual([]);
  });
});
