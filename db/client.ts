// Database connection: one pg pool wrapped by Drizzle.
import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema';

export type Db = NodePgDatabase<typeof schema>;

/** An open transaction on a Db. */
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

/** A pool-backed database or an open transaction: what every query function takes. */
export type Queryable = Db | Tx;

export function createDb(url: string, options: { max?: number } = {}): { db: Db; pool: pg.Pool } {
  const pool = new pg.Pool({ connectionString: url, max: options.max ?? 10 });
  // An idle client whose connection the server ends (a restart, a dropped database, a connection still closing
  // after pool.end()) makes the pool emit 'error'; with no listener that event would end the process. The pool
  // has already discarded the client, so the next query simply opens a new connection.
  pool.on('error', (err: Error & { code?: string }) => {
    console.error(`database: an idle connection was closed (${err.code ?? 'no code'}): ${err.message}`);
  });
  return { db: drizzle(pool, { schema }), pool };
}
