// pg-boss on the application's own PostgreSQL: one schema of queue tables shared by every API process and worker.
import PgBoss from 'pg-boss';
import type { ServerConfig } from '../env';
import { QUEUES } from './queue';

/** Plan runs: a retry covers a worker that crashed or was restarted mid-run (3 attempts in all). */
export const PLAN_RUN_RETRY_LIMIT = 2;
const PLAN_RUN_RETRY_DELAY_SECONDS = 2;
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
  const boss = new PgBoss({
    connectionString: config.databaseUrl,
    schema: opts.schema ?? config.jobSchema,
    // WARNING: expired jobs (a worker that died mid-run) are only noticed on a maintenance pass, so this
    // interval is part of how long a crashed plan run waits before its retry.
    maintenanceIntervalSeconds: config.jobMaintenanceSeconds,
    max: 4,
  });
  // An unhandled 'error' event would crash the process; queue trouble (a lost connection) is logged and retried.
  boss.on('error', (err) => log(`job queue: ${err instanceof Error ? err.message : String(err)}`));
  await boss.start();
  await ensureQueues(boss);
  return boss;
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
  await ensureQueue(boss, QUEUES.mailDead, { retryLimit: 2, retryDelay: 5 });
  await ensureQueue(boss, QUEUES.mail, {
    retryLimit: MAIL_RETRY_LIMIT, retryDelay: MAIL_RETRY_DELAY_SECONDS, retryBackoff: true, deadLetter: QUEUES.mailDead,
  });
}
