// Database connection: one pg pool wrapped by Drizzle.
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Db = NodePgDatabase<typeof schema>;

/** An open transaction on a Db. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** A pool-backed database or an open transaction: what every query function takes. */
export type Queryable = Db | Tx;

/**
 * WARNING: without a connect timeout a request waits forever for a connection to a server that does not answer
 * (a network partition); with it, the wait ends in an error the API answers 503 DATABASE_UNAVAILABLE.
 */
export const CONNECT_TIMEOUT_MS = 5_000;

export type PoolOptions = {
  max?: number;
  connectTimeoutMs?: number;
  /** shown in pg_stat_activity */
  applicationName?: string;
  /** told when a connection the pool holds is ended by the server (default: one line on stderr) */
  onConnectionLost?: (err: Error & { code?: string }) => void;
};

function logConnectionLost(err: Error & { code?: string }): void {
  console.error(`database: a connection was closed (${err.code ?? 'no code'}): ${err.message}`);
}

/**
 * A pg pool that survives the database going away. The pool's own 'error' event covers an idle client; a
 * client that is checked out (a transaction between two queries, or a query whose socket is reset) emits 'error'
 * on itself, and pg-pool removes its listener at check-out, so each client gets one of its own. Without a
 * listener either event would end the process. A broken client is discarded when released, and the next query
 * opens a new connection, so service resumes by itself once the database is back.
 */
export function createPool(url: string, options: PoolOptions = {}): pg.Pool {
  const onConnectionLost = options.onConnectionLost ?? logConnectionLost;
  const pool = new pg.Pool({
    connectionString: url, max: options.max ?? 10,
    connectionTimeoutMillis: options.connectTimeoutMs ?? CONNECT_TIMEOUT_MS,
    // TCP keep-alive: a connection silently cut (a firewall, a dead host) is noticed rather than left hanging.
    keepAlive: true,
    ...(options.applicationName ? { application_name: options.applicationName } : {}),
  });
  pool.on('error', onConnectionLost);
  // The pool reports the same failure for an idle client, so this listener only has to exist.
  pool.on('connect', (client) => client.on('error', () => undefined));
  return pool;
}

export function createDb(url: string, options: PoolOptions = {}): { db: Db; pool: pg.Pool } {
  const pool = createPool(url, options);
  return { db: drizzle(pool, { schema }), pool };
}
