// Finds plan runs whose worker died (no heartbeat for a while) and hands them back to the queue at once, rather
// than waiting for pg-boss to expire the job (time limit × 3 + minutes of headroom). The expiry stays as the
// backstop. Every worker sweeps; the guarded UPDATE lets only one of them take a given run back.
import { and, eq, lt, sql } from 'drizzle-orm';
import type PgBoss from 'pg-boss';
import type { Db } from '../../db/client';
import { plans } from '../../db/schema';
import { QUEUES } from './queue';

export type SweepResult = { planId: string; jobId: string | null }[];

/** Runs `running` with a heartbeat older than `staleSeconds` (database clock) go back to `queued`; their jobs fail into a retry. */
export async function sweepStalledRuns(db: Db, boss: PgBoss, staleSeconds: number): Promise<SweepResult> {
  const stale = and(
    eq(plans.status, 'running'),
    lt(plans.heartbeatAt, sql`now() - make_interval(secs => ${staleSeconds})`),
  );
  const taken = await db.update(plans).set({ status: 'queued', progress: null }).where(stale)
    .returning({ planId: plans.id, jobId: plans.jobId });
  for (const run of taken) {
    // pg-boss turns the failed job into a retry (or, with retries used up, sends it to the dead-letter queue).
    if (run.jobId) await boss.fail(QUEUES.planRun, run.jobId, { message: `no heartbeat for ${staleSeconds} s: the worker stopped` });
  }
  return taken;
}

/** Sweeps every `everySeconds` until stopped; errors (a database hiccup) are logged and the next sweep tries again. */
export function startSweeper(db: Db, boss: PgBoss, o: { staleSeconds: number; everySeconds: number; log: (line: string) => void }): () => void {
  const timer = setInterval(() => {
    sweepStalledRuns(db, boss, o.staleSeconds)
      .then((taken) => taken.forEach((t) => o.log(`plan ${t.planId}: worker stopped sending heartbeats; back to the queue`)))
      .catch((err: unknown) => o.log(`plan sweep failed: ${err instanceof Error ? err.message : String(err)}`));
  }, o.everySeconds * 1000);
  timer.unref();
  return () => clearInterval(timer);
}
