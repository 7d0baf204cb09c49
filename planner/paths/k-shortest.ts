// k loopless shortest-latency paths (Yen) and exhaustive simple-path enumeration for tiny instances.
// Reference: J. Y. Yen, "Finding the K Shortest Loopless Paths in a Network", Management Science 17(11), 1971.
import { InvalidOptionError } from '../errors';
import type { NetworkModel } from '../model/types';
import { shortestLatencyPath, spanUsable, type LatencyPath, type PathOptions } from './shortest-path';

function sitesAlong(net: NetworkModel, from: number, spans: readonly number[]): number[] {
  const sites = [from];
  for (const x of spans) {
    const at = sites[sites.length - 1];
    sites.push(net.spans[x].a === at ? net.spans[x].b : net.spans[x].a);
  }
  return sites;
}

function sameStart(a: readonly number[], b: readonly number[], length: number): boolean {
  if (a.length < length || b.length < length) return false;
  for (let i = 0; i < length; i++) if (a[i] !== b[i]) return false;
  return true;
}

/** Ascending latency; equal latencies ordered by span list so results never depend on discovery order. */
function comparePaths(a: LatencyPath, b: LatencyPath): number {
  if (a.latencyMs !== b.latencyMs) return a.latencyMs - b.latencyMs;
  const n = Math.min(a.spans.length, b.spans.length);
  for (let i = 0; i < n; i++) if (a.spans[i] !== b.spans[i]) return a.spans[i] - b.spans[i];
  return a.spans.length - b.spans.length;
}

/** Yen's spur step: deviations from the last found path at each of its sites. */
function spurCandidates(
  net: NetworkModel, from: number, to: number, found: LatencyPath[], opts: PathOptions,
): LatencyPath[] {
  const last = found[found.length - 1];
  const sites = sitesAlong(net, from, last.spans);
  const out: LatencyPath[] = [];
  let rootMs = 0;
  for (let j = 0; j < last.spans.length; j++) {
    const spanDown = opts.spanDown ? opts.spanDown.slice() : new Uint8Array(net.spans.length);
    const siteDown = opts.siteDown ? opts.siteDown.slice() : new Uint8Array(net.sites.length);
    for (const p of found) if (sameStart(p.spans, last.spans, j)) spanDown[p.spans[j]] = 1;
    for (let r = 0; r < j; r++) siteDown[sites[r]] = 1;
    const maxLatencyMs = opts.maxLatencyMs === undefined ? undefined : opts.maxLatencyMs - rootMs;
    const spur = shortestLatencyPath(net, sites[j], to, { ...opts, spanDown, siteDown, maxLatencyMs });
    if (spur !== null) out.push({ spans: [...last.spans.slice(0, j), ...spur.spans], latencyMs: rootMs + spur.latencyMs });
    rootMs += net.spans[last.spans[j]].latencyMs;
  }
  return out;
}

/** Yen's paths one at a time, shortest first: the k-th costs nothing until it is asked for. */
export interface PathEnumerator {
  /** the next shortest loopless path, or null when there are no more */
  next(): LatencyPath | null;
}

export function pathEnumerator(net: NetworkModel, from: number, to: number, opts: PathOptions = {}): PathEnumerator {
  const found: LatencyPath[] = [];
  const seen = new Set<string>();
  const pool: LatencyPath[] = [];
  let done = false;
  return {
    next() {
      if (done) return null;
      if (found.length === 0) {
        const first = shortestLatencyPath(net, from, to, opts);
        if (first === null) { done = true; return null; }
        found.push(first);
        seen.add(first.spans.join(','));
        return first;
      }
      for (const c of spurCandidates(net, from, to, found, opts)) {
        const key = c.spans.join(',');
        if (!seen.has(key)) {
          seen.add(key);
          pool.push(c);
        }
      }
      if (pool.length === 0) { done = true; return null; }
      pool.sort(comparePaths);
      const path = pool.shift()!;
      found.push(path);
      return path;
    },
  };
}

export function kShortestPaths(net: NetworkModel, from: number, to: number, k: number, opts: PathOptions = {}): LatencyPath[] {
  if (!Number.isInteger(k) || k < 1) throw new InvalidOptionError(`k must be a positive integer, got ${k}`);
  const paths = pathEnumerator(net, from, to, opts);
  const found: LatencyPath[] = [];
  for (let p = paths.next(); p !== null; p = found.length < k ? paths.next() : null) found.push(p);
  return found;
}

export interface AllPathsOptions extends PathOptions {
  maxPaths: number;
}

/** Every simple path (no repeated site), up to maxPaths found in depth-first order, then sorted by latency. */
export function allSimplePaths(net: NetworkModel, from: number, to: number, opts: AllPathsOptions): LatencyPath[] {
  if (!Number.isInteger(opts.maxPaths) || opts.maxPaths < 1) throw new InvalidOptionError('maxPaths must be a positive integer');
  if (opts.siteDown && (opts.siteDown[from] || opts.siteDown[to])) return [];
  if (from === to) return [{ spans: [], latencyMs: 0 }];
  const limit = opts.maxLatencyMs ?? Infinity;
  const onPath = new Uint8Array(net.sites.length);
  const spans: number[] = [];
  const out: LatencyPath[] = [];
  const visit = (site: number, latencyMs: number): void => {
    if (site === to) {
      out.push({ spans: [...spans], latencyMs });
      return;
    }
    onPath[site] = 1;
    for (let k = net.adjStart[site]; k < net.adjStart[site + 1] && out.length < opts.maxPaths; k++) {
      const next = net.adjSite[k];
      const span = net.adjSpan[k];
      const d = latencyMs + net.spans[span].latencyMs;
      if (onPath[next] || d > limit || !spanUsable(net, span, opts)) continue;
      spans.push(span);
      visit(next, d);
      spans.pop();
    }
    onPath[site] = 0;
  };
  visit(from, 0);
  return out.sort(comparePaths);
}
