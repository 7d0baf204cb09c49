// GET /metrics: the Prometheus text format. Outside /api and without a session: a scraper is not a person.
// Access (METRICS_ACCESS): `token` needs `Authorization: Bearer <METRICS_TOKEN>`; `loopback` serves only clients on
// this machine that did not come through a proxy; `open` serves anyone (a scrape network you control).
import { createHash, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import type pg from 'pg';
import type { Db } from '../../db/client';
import type { ServerConfig } from '../env';
import { domainError } from '../errors';
import { selectQueueDepth } from '../queries/metrics/queue-depth';
import { databaseReachable, dbPoolConnections, dbPoolWaiting, jobQueueJobs, registry } from './registry';

export class MetricsTokenRequiredError extends domainError('METRICS_TOKEN_REQUIRED', 401,
  () => 'Metrics need the bearer token set in METRICS_TOKEN.') {}

export class MetricsLoopbackOnlyError extends domainError('METRICS_LOOPBACK_ONLY', 403,
  () => 'Metrics are served only to clients on this machine; set METRICS_TOKEN to scrape from elsewhere.') {}

export type MetricsDeps = { db: Db; pool?: pg.Pool; config: Pick<ServerConfig, 'metrics' | 'jobSchema'> };

/** How long a scrape waits for the queue-depth query before reporting the database unreachable. */
const QUEUE_QUERY_TIMEOUT_MS = 1000;
/** A reverse proxy adds one of these: a request carrying one came from elsewhere, whatever its socket says. */
const PROXY_HEADERS = ['forwarded', 'x-forwarded-for', 'x-real-ip'];
/** PostgreSQL: no such table / schema (pg-boss not installed in this database yet). */
const NO_QUEUE_TABLE = new Set(['42P01', '3F000']);

export function isLoopbackAddress(address: string | undefined): boolean {
  if (!address) return false;
  const v4 = address.startsWith('::ffff:') ? address.slice('::ffff:'.length) : address;
  return v4 === '::1' || /^127\.\d{1,3}\.\d{1,3}\.\d{1,3}$/.test(v4);
}

function digest(value: string): Buffer {
  return createHash('sha256').update(value).digest();
}

function hasToken(req: Request, token: string): boolean {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(req.get('authorization') ?? '');
  // Equal-length digests: the comparison takes the same time whatever was sent.
  return match !== null && timingSafeEqual(digest(match[1]), digest(token));
}

/** Null when the request may read the metrics, else the refusal. */
export function metricsRefusal(req: Request, access: ServerConfig['metrics']): Error | null {
  if (access.mode === 'open') return null;
  if (access.mode === 'token') return access.token !== null && hasToken(req, access.token) ? null : new MetricsTokenRequiredError();
  const proxied = PROXY_HEADERS.some((h) => req.headers[h] !== undefined);
  return !proxied && isLoopbackAddress(req.socket.remoteAddress) ? null : new MetricsLoopbackOnlyError();
}

function errorCode(err: unknown): string | undefined {
  const e = err as { code?: unknown; cause?: { code?: unknown } };
  const code = e?.code ?? e?.cause?.code;
  return typeof code === 'string' ? code : undefined;
}

/** Sets the queue gauges from the database; a slow or failing database shows as slackwater_database_reachable 0. */
async function refreshQueueDepth(db: Db, jobSchema: string): Promise<void> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<'timeout'>((resolve) => { timer = setTimeout(() => resolve('timeout'), QUEUE_QUERY_TIMEOUT_MS); });
  const query = selectQueueDepth(db, jobSchema).then((rows) => ({ rows }), (err: unknown) => ({ err }));
  try {
    const outcome = await Promise.race([query, timeout]);
    jobQueueJobs.reset();
    if (outcome === 'timeout') {
      databaseReachable.set(0);
    } else if ('err' in outcome) {
      databaseReachable.set(NO_QUEUE_TABLE.has(errorCode(outcome.err) ?? '') ? 1 : 0);
    } else {
      databaseReachable.set(1);
      for (const row of outcome.rows) jobQueueJobs.set({ queue: row.queue, state: row.state }, row.jobs);
    }
  } finally {
    clearTimeout(timer);
  }
}

function refreshPool(pool: pg.Pool): void {
  dbPoolConnections.set({ state: 'in_use' }, pool.totalCount - pool.idleCount);
  dbPoolConnections.set({ state: 'idle' }, pool.idleCount);
  dbPoolWaiting.set(pool.waitingCount);
}

export function metricsEndpoint(deps: MetricsDeps): RequestHandler {
  return async (req, res, next) => {
    const refusal = metricsRefusal(req, deps.config.metrics);
    if (refusal) {
      if (refusal instanceof MetricsTokenRequiredError) res.setHeader('WWW-Authenticate', 'Bearer realm="metrics"');
      return next(refusal);
    }
    if (deps.pool) refreshPool(deps.pool);
    await refreshQueueDepth(deps.db, deps.config.jobSchema);
    res.setHeader('Content-Type', registry.contentType);
    res.setHeader('Cache-Control', 'no-store');
    res.send(await registry.metrics());
  };
}
