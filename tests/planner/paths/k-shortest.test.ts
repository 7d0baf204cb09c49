import fc from 'fast-check';
import { buildInventory } from '../../../planner/model/build-inventory';
import { allSimplePaths, kShortestPaths } from '../../../planner/paths/k-shortest';
import { shortestLatencyPath } from '../../../planner/paths/shortest-path';
import { InvalidOptionError } from '../../../planner/errors';
import type { NetworkModel } from '../../../planner/model/types';
import { scenarioWith, tinyNetwork } from '../fixtures/tiny-scenario';
import { randomNetwork } from '../fixtures/random-scenario';

function isSimplePath(net: NetworkModel, from: number, to: number, spans: number[]): boolean {
  const visited = new Set([from]);
  let at = from;
  for (const x of spans) {
    const s = net.spans[x];
    if (s.a !== at && s.b !== at) return false;
    at = s.a === at ? s.b : s.a;
    if (visited.has(at)) return false;
    visited.add(at);
  }
  return at === to;
}

describe('kShortestPaths (Yen)', () => {
  it('matches the k best of an exhaustive enumeration on random multigraphs', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e6 }), fc.integer({ min: 2, max: 7 }), fc.integer({ min: 0, max: 12 }), fc.integer({ min: 1, max: 8 }),
        (seed, n, m, k) => {
          const net = buildInventory(scenarioWith([], randomNetwork(seed, n, m))).network;
          const to = n - 1;
          const yen = kShortestPaths(net, 0, to, k);
          const all = allSimplePaths(net, 0, to, { maxPaths: 100_000 });
          expect(yen.length).toBe(Math.min(k, all.length));
          yen.forEach((p, i) => {
            expect(isSimplePath(net, 0, to, p.spans)).toBe(true);
            expect(p.latencyMs).toBeCloseTo(all[i].latencyMs, 9);
          });
          expect(new Set(yen.map((p) => p.spans.join(','))).size).toBe(yen.length);
          if (yen.length > 0) expect(yen[0].latencyMs).toBeCloseTo(shortestLatencyPath(net, 0, to)!.latencyMs, 12);
        }),
      { numRuns: 200 },
    );
  });

  it('honours down elements and the latency limit', () => {
    const net = buildInventory(scenarioWith([], tinyNetwork())).network;
    const [A, D] = [net.siteIndex.get('A')!, net.siteIndex.get('D')!];
    const both = kShortestPaths(net, A, D, 5);
    expect(both.map((p) => p.spans.map((x) => net.spans[x].id))).toEqual([['ab', 'bd'], ['ac', 'cd']]);
    const spanDown = new Uint8Array(net.spans.length);
    spanDown[net.spanIndex.get('ab')!] = 1;
    expect(kShortestPaths(net, A, D, 5, { spanDown })).toHaveLength(1);
    expect(kShortestPaths(net, A, D, 5, { maxLatencyMs: both[0].latencyMs })).toHaveLength(1);
    expect(() => kShortestPaths(net, A, D, 0)).toThrow(InvalidOptionError);
  });
});

describe('allSimplePaths', () => {
  it('stops at maxPaths and sorts by latency', () => {
    const net = buildInventory(scenarioWith([], tinyNetwork())).network;
    const [A, E] = [net.siteIndex.get('A')!, net.siteIndex.get('E')!];
    const all = allSimplePaths(net, A, E, { maxPaths: 10 });
    expect(all).toHaveLength(2);
    expect(all[0].latencyMs).toBeLessThanOrEqual(all[1].latencyMs);
    expect(allSimplePaths(net, A, E, { maxPaths: 1 })).toHaveLength(1);
    expect(allSimplePaths(net, A, A, { maxPaths: 3 })).toEqual([{ spans: [], latencyMs: 0 }]);
  });
});
