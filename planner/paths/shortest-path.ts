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
  /** when given, each bandwidth test is appended as (span, 1 when minGbps fits else 0), in the order made */
  examined?: number[];
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
    const ok = fits(opts.minGbps, residual);
    opts.examined?.push(span, ok ? 1 : 0);
    if (!ok) return false;
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

/**
 * Scratch arrays reused across calls on the same network: the decoder routes thousands of ties per
 * second, and allocating network-sized arrays per call dominated its time. A stamp per site marks
 * which entries belong to the current search, so nothing needs clearing between calls.
 * WARNING: not re-entrant; each worker thread has its own module instance, so threads are safe.
 */
interface Workspace {
  dist: Float64Array;
  prevSpan: Int32Array;
  seen: Uint32Array;
  done: Uint32Array;
  heap: MinHeap;
  stamp: number;
}
const workspaces = new WeakMap<NetworkModel, Workspace>();

function workspaceFor(net: NetworkModel): Workspace {
  let ws = workspaces.get(net);
  if (!ws) {
    const n = net.sites.length;
    ws = { dist: new Float64Array(n), prevSpan: new Int32Array(n), seen: new Uint32Array(n),
      done: new Uint32Array(n), heap: new MinHeap(Math.min(n, 1024)), stamp: 0 };
    workspaces.set(net, ws);
  }
  if (++ws.stamp === 0xffffffff) {
    ws.seen.fill(0);
    ws.done.fill(0);
    ws.stamp = 1;
  }
  ws.heap.size = 0;
  return ws;
}

export function shortestLatencyPath(
  net: NetworkModel, from: number, to: number, opts: PathOptions = {},
): LatencyPath | null {
  if (opts.siteDown && (opts.siteDown[from] || opts.siteDown[to])) return null;
  if (from === to) return { spans: [], latencyMs: 0 };
  const limit = opts.maxLatencyMs ?? Infinity;
  const { dist, prevSpan, seen, done, heap, stamp } = workspaceFor(net);
  dist[from] = 0;
  seen[from] = stamp;
  heap.push(0, from);
  while (heap.size > 0) {
    const site = heap.pop();
    if (done[site] === stamp) continue;
    done[site] = stamp;
    if (site === to) return { spans: tracePath(net, prevSpan, from, to), latencyMs: dist[to] };
    for (let k = net.adjStart[site]; k < net.adjStart[site + 1]; k++) {
      const next = net.adjSite[k];
      const span = net.adjSpan[k];
      if (done[next] === stamp || !spanUsable(net, span, opts)) continue;
      const d = dist[site] + net.spans[span].latencyMs;
      if ((seen[next] !== stamp || d < dist[next]) && d <= limit) {
        seen[next] = stamp;
        dist[next] = d;
        prevSpan[next] = span;
        heap.push(d, next);
      }
    }
  }
  return null;
}
