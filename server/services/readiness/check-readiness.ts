// Readiness: a real query within a short time, the job queue running, every committed migration applied.
// Each check answers on its own, so the probe says everything that is wrong at once.
import type { Readiness } from '../../../shared/readiness';
import { isDatabaseUnavailable, unavailableCode } from '../../db-unavailable';

export type ReadinessPorts = {
  /** a real query (select 1); rejects when the database refuses it */
  query: () => Promise<unknown>;
  /** the journal `when` (ms) of every migration the database applied */
  appliedMigrations: () => Promise<Set<number>>;
  /** the migrations committed with this build, oldest first */
  committedMigrations: { tag: string; createdAtMs: number }[];
  /** whether this process's job queue is started and not stopped */
  jobQueueRunning: () => boolean;
  /** how long the database checks may take in all */
  timeoutMs: number;
};

class CheckTimeout extends Error {}

async function within<T>(work: Promise<T>, timeoutMs: number): Promise<T> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new CheckTimeout()), timeoutMs);
  });
  try {
    return await Promise.race([work, late]);
  } finally {
    clearTimeout(timer);
  }
}

/** Why a database check failed, without the query or its values. */
function whyFailed(err: unknown, timeoutMs: number): string {
  if (err instanceof CheckTimeout) return `no answer within ${timeoutMs} ms`;
  if (isDatabaseUnavailable(err)) {
    const code = unavailableCode(err);
    return `cannot be reached${code ? ` (${code})` : ''}`;
  }
  const code = (err as { code?: unknown; cause?: { code?: unknown } }).code ?? (err as { cause?: { code?: unknown } }).cause?.code;
  return `the query failed${typeof code === 'string' ? ` (${code})` : ''}`;
}

function migrationsCheck(committed: ReadinessPorts['committedMigrations'], applied: Set<number>): Readiness['checks']['migrations'] {
  const missing = committed.filter((m) => !applied.has(m.createdAtMs)).map((m) => m.tag);
  if (missing.length === 0) return { ok: true, detail: `all ${committed.length} applied` };
  return { ok: false, detail: `${missing.length} of ${committed.length} not applied: ${missing.join(', ')}` };
}

export async function checkReadiness(ports: ReadinessPorts): Promise<Readiness> {
  const database = await within(ports.query(), ports.timeoutMs)
    .then(() => ({ ok: true, detail: 'answers' }), (err: unknown) => ({ ok: false, detail: whyFailed(err, ports.timeoutMs) }));
  const migrations = !database.ok
    ? { ok: false, detail: 'not checked: the database does not answer' }
    : await within(ports.appliedMigrations(), ports.timeoutMs)
      .then((applied) => migrationsCheck(ports.committedMigrations, applied), (err: unknown) => ({ ok: false, detail: whyFailed(err, ports.timeoutMs) }));
  const running = ports.jobQueueRunning();
  const jobQueue = { ok: running, detail: running ? 'running' : 'not running' };
  const checks = { database, jobQueue, migrations };
  const names = { database: 'Database', jobQueue: 'Job queue', migrations: 'Migrations' } as const;
  const problems = (Object.keys(checks) as (keyof typeof checks)[])
    .filter((k) => !checks[k].ok).map((k) => `${names[k]}: ${checks[k].detail}`);
  return { ready: problems.length === 0, checks, problems };
}
