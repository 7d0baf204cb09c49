// Shortest-latency path on the CSR arrays: binary-heap Dijkstra with down elements and a bandwidth filter.
// Reference: E. W. Dijkstra, "A note on two problems in connexion with graphs", Numerische Mathematik 1, 1959.
import { fits } from '../model/tolerance';
import type { NetworkModel } from '../model/types';
import { MinHeap } from './min-heap';

export interface PathOptions {
  spanDown?: Uint8Array;
  siteDown?: Uint8Array;
  /** remaining bandwidth per span; spans are usable when minGbps fits in it */
  residualGbps?: Float64Array;
  minGbps?: number;
  /** give up on anything longer (also prunes the search) */
  maxLatencyMs?: number;
}

export interface LatencyPath {
  /** span indices, ordered from `from` */
  spans: number[];
  latencyMs: number;
}

/** Whether a span may carry traffic under the options (not down, no end site down, enough bandwidth). */
export function spanUsable(net: NetworkModel, span: number, opts: PathOptions): boolean {
  if (opts.spanDown?.[span]) return false;
  const s = net.spans[span];
  if (opts.siteDown && (opts.siteDown[s.a] || opts.siteDown[s.b])) return false;
  if (opts.minGbps !== undefined) {
    const residual = opts.residualGbps ? opts.residualGbps[span] : s.capacityGbps;
    if (!fits(opts.minGbps, residual)) return false;
  }
  return true;
}

function tracePath(net: NetworkModel, prevSpan: Int32Array, from: number, to: number): number[] {
  const spans: number[] = [];
  for (let site = to; site !== from;) {
    const span = prevSpan[site];
    spans.push(span);
    const s = net.spans[span];
    site = s.a === site ? s.b : s.a;
  }
  return spans.reverse();
}

export function shortestLatencyPath(
  net: NetworkModel, from: number, to: number, opts: PathOptions = {},
): LatencyPath | null {
  if (opts.siteDown && (opts.siteDown[from] || opts.siteDown[to])) return null;
  if (from === to) return { spans: [], latencyMs: 0 };
  const n = net.sites.length;
  const limit = opts.maxLatencyMs ?? Infinity;
  const dist = new Float64Array(n).fill(Infinity);
  const prevSpan = new Int32Array(n).fill(-1);
  const done = new Uint8Array(n);
  const heap = new MinHeap(Math.min(n, 1024));
  dist[from] = 0;
  heap.push(0, from);
  while (heap.size > 0) {
    const site = heap.pop();
    if (done[site]) continue;
    done[site] = 1;
    if (site === to) return { spans: tracePath(net, prevSpan, from, to), latencyMs: dist[to] };
    for (let k = net.adjStart[site]; k < net.adjStart[site + 1]; k++) {
      const next = net.adjSite[k];
      const span = net.adjSpan[k];
      if (done[next] || !spanUsable(net, span, opts)) continue;
      const d = dist[site] + net.spans[span].latencyMs;
      if (d < dist[next] && d <= limit) {
        dist[next] = d;
        prevSpan[next] = span;
        heap.push(d, next);
      }
    }
  }
  return null;
}
