// Global resource capacity (GRC) node ranking: a PageRank-like score mixing a site's CPU share with the
// bandwidth-weighted rank of its neighbours. Reference: L. Gong et al., "Toward profit-seeking virtual
// network embedding algorithm via global resource capacity", IEEE INFOCOM 2014 (memory).
import type { NetworkModel } from '../model/types';

export const GRC_DAMPING = 0.85;
const TOLERANCE = 1e-12;
const MAX_ITERATIONS = 10_000;

/** c_i = CPU_i / ΣCPU (uniform when no site has CPU left). */
function cpuShare(cpu: Float64Array): Float64Array {
  let total = 0;
  for (const v of cpu) total += Math.max(0, v);
  const n = cpu.length;
  return total > 0 ? Float64Array.from(cpu, (v) => Math.max(0, v) / total) : new Float64Array(n).fill(n ? 1 / n : 0);
}

/** S_j = Σ_k bw(k, j): each site's total incident bandwidth (self-loops carry nothing between sites). */
function incidentGbps(net: NetworkModel, spanGbps: Float64Array): Float64Array {
  const total = new Float64Array(net.sites.length);
  for (const span of net.spans) {
    if (span.a === span.b) continue;
    const g = Math.max(0, spanGbps[span.index]);
    total[span.a] += g;
    total[span.b] += g;
  }
  return total;
}

/**
 * r = (1 − d)·c + d·M·r with M_ij = bw(i, j) / Σ_k bw(k, j), iterated until the L1 change is below 1e-12.
 * Sites without bandwidth have an empty column in M; their rank mass is handed back in proportion to c
 * (the usual PageRank treatment of dangling nodes, our choice) so the ranks always sum to 1.
 */
export function grcRank(net: NetworkModel, cpu: Float64Array, spanGbps: Float64Array, d = GRC_DAMPING): Float64Array {
  const n = net.sites.length;
  const c = cpuShare(cpu);
  const total = incidentGbps(net, spanGbps);
  let r = Float64Array.from(c);
  let next = new Float64Array(n);
  for (let iter = 0; iter < MAX_ITERATIONS; iter += 1) {
    let dangling = 0;
    for (let j = 0; j < n; j += 1) if (total[j] <= 0) dangling += r[j];
    let change = 0;
    for (let i = 0; i < n; i += 1) {
      let flow = 0;
      for (let k = net.adjStart[i]; k < net.adjStart[i + 1]; k += 1) {
        const j = net.adjSite[k];
        if (j === i) continue;
        const g = Math.max(0, spanGbps[net.adjSpan[k]]);
        if (g > 0) flow += (g / total[j]) * r[j];
      }
      next[i] = (1 - d) * c[i] + d * (flow + dangling * c[i]);
      change += Math.abs(next[i] - r[i]);
    }
    [r, next] = [next, r];
    if (change < TOLERANCE) break;
  }
  return r;
}
