// GRC node ranking, r = (1−d)c + dMr (Gong et al., INFOCOM 2014 — memory, not confirmed; per REFERENCES.md).
import { grcRank } from '../../../planner/greedy/grc';
import { buildNetwork } from '../../../planner/model/build-network';
import type { ScenarioSite, ScenarioSpan } from '../../../shared/scenario';

const site = (id: string, cpu: number): ScenarioSite => ({ id, name: id, kind: 'edge', lat: 50, lon: 10, cpu });
const span = (id: string, a: string, b: string, capacityGbps: number): ScenarioSpan => ({ id, a, b, capacityGbps, lengthKm: 10 });

describe('grcRank', () => {
  it('matches a hand-computed fixed point on the path A–B–C', () => {
    // c = (1,2,1)/4; S = (10, 40, 30); M_AB = 10/40, M_BA = 10/10, M_BC = 30/30, M_CB = 30/40.
    // Solving r = 0.15c + 0.85Mr by hand: r_B = 0.13875/0.2775 = 0.5, r_A = 0.0375 + 0.2125·0.5 = 0.14375,
    // r_C = 0.0375 + 0.6375·0.5 = 0.35625.
    const net = buildNetwork([site('A', 1), site('B', 2), site('C', 1)], [span('ab', 'A', 'B', 10), span('bc', 'B', 'C', 30)]);
    const r = grcRank(net, Float64Array.from([1, 2, 1]), Float64Array.from([10, 30]));
    expect(r[0]).toBeCloseTo(0.14375, 10);
    expect(r[1]).toBeCloseTo(0.5, 10);
    expect(r[2]).toBeCloseTo(0.35625, 10);
  });

  it('agrees with a plain dense power iteration on a 4-site graph with parallel spans, and sums to 1', () => {
    const net = buildNetwork(
      [site('A', 30), site('B', 10), site('C', 50), site('D', 10)],
      [span('ab', 'A', 'B', 10), span('ab2', 'A', 'B', 5), span('bc', 'B', 'C', 20), span('cd', 'C', 'D', 40), span('ad', 'A', 'D', 8)],
    );
    const cpu = Float64Array.from([30, 10, 50, 10]);
    const gbps = Float64Array.from([10, 5, 20, 40, 8]);
    const bw = [[0, 15, 0, 8], [15, 0, 20, 0], [0, 20, 0, 40], [8, 0, 40, 0]];
    const colSum = [0, 1, 2, 3].map((j) => bw.reduce((s, row) => s + row[j], 0));
    const c = [30, 10, 50, 10].map((v) => v / 100);
    let r = [...c];
    for (let it = 0; it < 2000; it += 1) {
      r = c.map((ci, i) => 0.15 * ci + 0.85 * bw[i].reduce((s, b, j) => s + (b / colSum[j]) * r[j], 0));
    }
    const got = grcRank(net, cpu, gbps);
    got.forEach((v, i) => expect(v).toBeCloseTo(r[i], 9));
    expect(got.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 12);
  });

  it('still sums to 1 when a site with CPU has lost all its spans', () => {
    const net = buildNetwork([site('A', 10), site('B', 10), site('C', 10)], [span('ab', 'A', 'B', 10), span('bc', 'B', 'C', 10)]);
    const r = grcRank(net, Float64Array.from([10, 10, 10]), Float64Array.from([10, 0]));
    expect(r.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 12);
    expect(r[2]).toBeGreaterThan(0);
  });
});
