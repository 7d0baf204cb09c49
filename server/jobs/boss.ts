// pg-boss on the application's own PostgreSQL: one schema of queue tables shared by every API process and worker.
import type { Pool } from 'pg';
import PgBoss from 'pg-boss';
import { createPool } from '../../db/client';
import { retryWhileDatabaseUnavailable } from '../db-unavailable';
import type { ServerConfig } from '../env';
import { QUEUES } from './queue';

/** Plan runs: a retry covers a worker that crashed or was restarted mid-run (3 attempts in all). */
export const PLAN_RUN_RETRY_LIMIT = 2;
const PLAN_RUN_RETRY_DELAY_SECONDS = 2;
/** Slot searches and campaign plans: one retry covers a worker that died mid-search (2 attempts in all). */
export const SLOT_SEARCH_RETRY_LIMIT = 1;
const SLOT_SEARCH_RETRY_DELAY_SECONDS = 2;
/** Mail: a relay can be down for a while, so more attempts with exponential backoff. */
export const MAIL_RETRY_LIMIT = 3;
const MAIL_RETRY_DELAY_SECONDS = 15;

export type BossLog = (message: string) => void;

/**
 * Starts pg-boss (creating or migrating its schema) and makes sure the queues exist with the settings below.
 * pg-boss 10 refuses send/work on a queue that was never created, so this runs in every process before either.
 */
export async function startBoss(
  config: Pick<ServerConfig, 'databaseUrl' | 'jobMaintenanceSeconds' | 'jobSchema'>,
  opts: { schema?: string; log?: BossLog } = {},
): Promise<PgBoss> {
  const log = opts.log ?? ((m) => console.error(m));
  // The queue's own pool, built like the API's (db/client.ts): it survives a database restart. pg-boss only
  // calls executeSql on a database it is given, and leaves closing it to us (on its 'stopped' event below).
  const pool = createPool(config.databaseUrl, {
    max: 4, applicationName: 'pgboss',
    onConnectionLost: (err) => log(`job queue: a database connection was closed (${err.code ?? 'no code'}): ${err.message}`),
  });
  const schema = opts.schema ?? config.jobSchema;
  const boss = new PgBoss({
    db: { executeSql: outcomeKeepingSql(pool, schema, log) },
    schema,
    // WARNING: expired jobs (a worker that died mid-run) are only noticed on a maintenance pass, so this
    // interval is part of how long a crashed plan run waits before its retry.
    maintenanceIntervalSeconds: config.jobMaintenanceSeconds,
  });
  // An unhandled 'error' event would crash the process; queue trouble (a lost connection) is logged and retried.
  boss.on('error', (err) => log(`job queue: ${err instanceof Error ? err.message : String(err)}`));
  boss.once('stopped', () => void pool.end().catch(() => undefined));
  try {
    await boss.start();
    await ensureQueues(boss);
  } catch (err) {
    await pool.end().catch(() => undefined);
    throw err;
  }
  return boss;
}

// pg-boss's own statement texts, to recognise its job-outcome writes (the package has no exports map; 10.x).
const bossSql = require('pg-boss/src/plans') as { completeJobs(schema: string): string; failJobsById(schema: string): string };

/**
 * pg-boss records a job's outcome (complete / fail) after its handler returns, without awaiting it: during a
 * database outage that write would fail, its rejection go unhandled (ending the process), and the job be worked
 * again after its expiry — a mail sent twice. These two statements wait out the outage instead; every other
 * statement fails at once (a send from an API request answers 503 rather than hanging).
 */
export function outcomeKeepingSql(pool: Pool, schema: string, log: BossLog) {
  const outcomes = new Map([[bossSql.completeJobs(schema), 'completed'], [bossSql.failJobsById(schema), 'failed']]);
  return (text: string, values?: unknown[]) => {
    const outcome = outcomes.get(text);
    if (!outcome) return pool.query(text, values);
    return retryWhileDatabaseUnavailable(() => pool.query(text, values), {
      onWait: (_err, waitedMs) => {
        if (waitedMs === 0) log(`job queue: the database is unavailable; a job's ${outcome} state is recorded when it is back`);
      },
    });
  };
}

async function ensureQueue(boss: PgBoss, name: string, options: Omit<PgBoss.Queue, 'name'> = {}): Promise<void> {
  // createQueue leaves an existing queue as it was; updateQueue carries changed settings over to it.
  await boss.createQueue(name, { name, ...options });
  await boss.updateQueue(name, { name, ...options });
}

export async function ensureQueues(boss: PgBoss): Promise<void> {
  // Dead-letter queues first: a queue's deadLetter must name an existing queue.
  await ensureQueue(boss, QUEUES.planRunDead, { retryLimit: 2, retryDelay: 5 });
  await ensureQueue(boss, QUEUES.planRun, {
    retryLimit: PLAN_RUN_RETRY_LIMIT, retryDelay: PLAN_RUN_RETRY_DELAY_SECONDS, deadLetter: QUEUES.planRunDead,
  });
  await ensureQueue(boss, QUEUES.slotSearchDead, { retryLimit: 2, retryDelay: 5 });
  await ensureQueue(boss, QUEUES.slotSearch, {
    retryLimit: SLOT_SEARCH_RETRY_LIMIT, retryDelay: SLOT_SEARCH_RETRY_DELAY_SECONDS, deadLetter: QUEUES.slotSearchDead,
  });
  await ensureQueue(boss, QUEUES.mailDead, { retryLimit: 2, retryDelay: 5 });
  await ensureQueue(boss, QUEUES.mail, {
    retryLimit: MAIL_RETRY_LIMIT, retryDelay: MAIL_RETRY_DELAY_SECONDS, retryBackoff: true, deadLetter: QUEUES.mailDead,
  });
}
