// The measurements: sequential latency per route, a concurrent mix, the exports' first byte, one plan run.
import { performance } from 'node:perf_hooks';
import type { ApiClient } from './client';

/** Nearest-rank percentile of the values (ms). */
export function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)];
}

export type Route = { label: string; client: ApiClient; method: 'GET' | 'POST'; path: string; body?: unknown };
export type RouteTiming = { route: Route; samples: number[]; p50: number; p95: number; failure: string | null };

/**
 * One warm-up, then up to `count` requests one after another. A slow route stops after `budgetMs` (at least
 * five samples), so a network whose routes take seconds still finishes the bench in reasonable time.
 */
export async function timeRoute(route: Route, count: number, budgetMs: number): Promise<RouteTiming> {
  const samples: number[] = [];
  const started = performance.now();
  for (let i = 0; i <= count; i += 1) {
    const res = await route.client.timed(route.method, route.path, route.body);
    if (res.status < 200 || res.status > 299) {
      const failure = `HTTP ${res.status} ${res.body.toString('utf8').slice(0, 120)}`;
      return { route, samples, p50: NaN, p95: NaN, failure };
    }
    if (i > 0) samples.push(res.ms);
    if (samples.length >= 5 && performance.now() - started > budgetMs) break;
  }
  return { route, samples, p50: percentile(samples, 50), p95: percentile(samples, 95), failure: null };
}

export type LoadResult = {
  requests: number; errors: number; seconds: number; perSecond: number; p50: number; p99: number;
  /** p50 per route of the mix, to tell which one holds the others up */
  byRoute: { label: string; requests: number; p50: number }[];
};

/** `clients` loops sending the routes round-robin until `seconds` have passed; requests under way then still count. */
export async function concurrentLoad(routes: Route[], clients: number, seconds: number): Promise<LoadResult> {
  const latencies: number[] = [];
  const byLabel = new Map<string, number[]>(routes.map((r) => [r.label, []]));
  let errors = 0;
  let next = 0;
  const started = performance.now();
  const deadline = started + seconds * 1000;
  const client = async () => {
    while (performance.now() < deadline) {
      const route = routes[next++ % routes.length];
      const res = await route.client.timed(route.method, route.path, route.body).catch(() => null);
      if (!res || res.status < 200 || res.status > 299) errors += 1;
      else {
        latencies.push(res.ms);
        byLabel.get(route.label)!.push(res.ms);
      }
    }
  };
  await Promise.all(Array.from({ length: clients }, client));
  const elapsed = (performance.now() - started) / 1000;
  return {
    requests: latencies.length + errors, errors, seconds: elapsed, perSecond: latencies.length / elapsed,
    p50: latencies.length ? percentile(latencies, 50) : NaN, p99: latencies.length ? percentile(latencies, 99) : NaN,
    byRoute: [...byLabel.entries()].map(([label, ms]) => ({ label, requests: ms.length, p50: ms.length ? percentile(ms, 50) : NaN })),
  };
}

export type ExportTiming = { firstByteMs: number; totalMs: number; bytes: number; streamed: boolean };

/**
 * One download read to the end: time to the first body byte and to the last. Asked for uncompressed, so
 * `streamed` is a plain fact of the answer: sent in chunks, without a Content-Length known up front.
 */
export async function timeExport(client: ApiClient, path: string): Promise<ExportTiming> {
  const started = performance.now();
  const res = await client.raw(path, { 'accept-encoding': 'identity' });
  if (!res.ok || !res.body) throw new Error(`GET ${path} answered HTTP ${res.status}`);
  let firstByteMs = NaN;
  let bytes = 0;
  const reader = res.body.getReader();
  for (let chunk = await reader.read(); !chunk.done; chunk = await reader.read()) {
    if (bytes === 0) firstByteMs = performance.now() - started;
    bytes += chunk.value.byteLength;
  }
  const streamed = res.headers.get('content-length') === null && res.headers.get('transfer-encoding') === 'chunked';
  return { firstByteMs, totalMs: performance.now() - started, bytes, streamed };
}

/** One warm-up, then the median of `count` downloads (first byte and total each the median of its own). */
export async function timeExportMedian(client: ApiClient, path: string, count: number): Promise<ExportTiming> {
  await timeExport(client, path);
  const runs: ExportTiming[] = [];
  for (let i = 0; i < count; i += 1) runs.push(await timeExport(client, path));
  return {
    firstByteMs: percentile(runs.map((r) => r.firstByteMs), 50), totalMs: percentile(runs.map((r) => r.totalMs), 50),
    bytes: runs[0].bytes, streamed: runs.every((r) => r.streamed),
  };
}
