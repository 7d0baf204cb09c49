import fc from 'fast-check';
import dijkstra from 'dijkstrajs';
import { buildInventory } from '../../../planner/model/build-inventory';
import { shortestLatencyPath, spanUsable, type PathOptions } from '../../../planner/paths/shortest-path';
import type { NetworkModel } from '../../../planner/model/types';
import { scenarioWith } from '../fixtures/tiny-scenario';
import { randomNetwork } from '../fixtures/random-scenario';

/** Reference answer from dijkstrajs (REFERENCES.md: compare with ngraph.path or dijkstrajs). */
function referenceLatency(net: NetworkModel, from: number, to: number, opts: PathOptions): number | null {
  const graph: Record<string, Record<string, number>> = {};
  net.sites.forEach((s) => { graph[`s${s.index}`] = {}; });
  for (const span of net.spans) {
    if (!spanUsable(net, span.index, opts)) continue;
    const [a, b] = [`s${span.a}`, `s${span.b}`];
    // dijkstrajs keeps one edge per pair: the cheapest of parallel spans.
    graph[a][b] = Math.min(graph[a][b] ?? Infinity, span.latencyMs);
    graph[b][a] = graph[a][b];
  }
  let nodes: string[];
  try {
    nodes = dijkstra.find_path(graph, `s${from}`, `s${to}`);
  } catch {
    return null;
  }
  let total = 0;
  for (let i = 1; i < nodes.length; i++) total += graph[nodes[i - 1]][nodes[i]];
  return total;
}

function checkPath(net: NetworkModel, from: number, to: number, spans: number[], opts: PathOptions): number {
  let at = from;
  let total = 0;
  for (const s of spans) {
    const span = net.spans[s];
    expect(spanUsable(net, s, opts)).toBe(true);
    expect([span.a, span.b]).toContain(at);
    at = span.a === at ? span.b : span.a;
    total += span.latencyMs;
  }
  expect(at).toBe(to);
  return total;
}

const arbCase = fc.record({
  seed: fc.integer({ min: 0, max: 2 ** 31 - 1 }),
  n: fc.integer({ min: 2, max: 14 }),
  m: fc.integer({ min: 0, max: 30 }),
  minGbps: fc.option(fc.integer({ min: 1, max: 40 }), { nil: undefined }),
  downSpanSeed: fc.integer({ min: 0, max: 1000 }),
  downSite: fc.option(fc.nat(), { nil: undefined }),
});

describe('shortestLatencyPath', () => {
  it('finds the same latency as dijkstrajs on random graphs, honouring bandwidth and down elements', () => {
    fc.assert(
      fc.property(arbCase, ({ seed, n, m, minGbps, downSpanSeed, downSite }) => {
        const inv = buildInventory(scenarioWith([], randomNetwork(seed, n, m)));
        const net = inv.network;
        const spanDown = Uint8Array.from(net.spans, (_, i) => ((i * 7919 + downSpanSeed) % 5 === 0 ? 1 : 0));
        const siteDown = new Uint8Array(n);
        if (downSite !== undefined) siteDown[downSite % n] = 1;
        const residualGbps = Float64Array.from(net.spans, (s) => s.capacityGbps * 0.8);
        const opts: PathOptions = { spanDown, siteDown, residualGbps, minGbps };
        for (let to = 1; to < n; to++) {
          const ours = shortestLatencyPath(net, 0, to, opts);
          const ref = siteDown[0] || siteDown[to] ? null : referenceLatency(net, 0, to, opts);
          if (ref === null) {
            expect(ours).toBeNull();
            continue;
          }
          expect(ours).not.toBeNull();
          expect(ours!.latencyMs).toBeCloseTo(ref, 9);
          expect(checkPath(net, 0, to, ours!.spans, opts)).toBeCloseTo(ours!.latencyMs, 9);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('returns an empty path for from === to and respects maxLatencyMs', () => {
    const net = buildInventory(scenarioWith([], randomNetwork(7, 6, 10, { connected: true }))).network;
    expect(shortestLatencyPath(net, 3, 3)).toEqual({ spans: [], latencyMs: 0 });
    const best = shortestLatencyPath(net, 0, 5)!;
    expect(shortestLatencyPath(net, 0, 5, { maxLatencyMs: best.latencyMs })?.latencyMs).toBe(best.latencyMs);
    expect(shortestLatencyPath(net, 0, 5, { maxLatencyMs: best.latencyMs * 0.999 })).toBeNull();
  });

  it('skips spans whose residual bandwidth is too small', () => {
    const net = buildInventory(scenarioWith([], randomNetwork(11, 2, 0, { connected: true }))).network;
    const residualGbps = Float64Array.of(3);
    expect(shortestLatencyPath(net, 0, 1, { residualGbps, minGbps: 3 })).not.toBeNull();
    expect(shortestLatencyPath(net, 0, 1, { residualGbps, minGbps: 3.5 })).toBeNull();
  });
});
