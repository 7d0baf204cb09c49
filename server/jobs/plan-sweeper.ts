// Finds plan runs whose worker died (no heartbeat for a while) and hands them back to the queue at once, rather
// than waiting for pg-boss to expire the job (time limit × 3 + minutes of headroom). The expiry stays as the
// backstop. Every worker sweeps; the guarded UPDATE lets only one of them take a given run back.
import type PgBoss from 'pg-boss';
import type { Db } from '../../db/client';
import { planSettingsSchema } from '../../shared/plans';
import { planExpireSeconds } from '../services/plans/expire';
import { endPlanRun, setPlanJobId } from '../queries/plans/plan-rows';
import { requeueStalledRuns } from '../queries/plans/plan-run-rows';
import { createJobQueue } from './boss-queue';
import { QUEUES } from './queue';

export type SweepResult = { planId: string; jobId: string | null }[];

/**
 * Runs `running` with a heartbeat older than `staleSeconds` (database clock) go back to `queued` and their job is
 * failed into a retry. A job that is no longer active (a stalled worker that woke up may have completed it) gets a
 * fresh job; one whose retries are used up ends the run `failed`.
 */
export async function sweepStalledRuns(db: Db, boss: PgBoss, staleSeconds: number, expireMarginSeconds = 120): Promise<SweepResult> {
  const taken = await requeueStalledRuns(db, staleSeconds);
  const reason = `no heartbeat for ${staleSeconds} s: the worker stopped`;
  for (const run of taken) {
    const job = run.jobId ? await boss.getJobById(QUEUES.planRun, run.jobId) : null;
    if (job?.state === 'active') {
      // pg-boss turns the failed job into a retry (or, with retries used up, sends it to the dead-letter queue).
      await boss.fail(QUEUES.planRun, job.id, { message: reason });
    } else if (job?.state === 'failed') {
      const error = `The run was given up: ${reason}.`;
      await endPlanRun(db, run.planId, { from: ['queued', 'running'], to: 'failed', error, now: new Date() });
    } else if (job?.state !== 'created' && job?.state !== 'retry') {
      const settings = planSettingsSchema.parse(run.settings);
      const expireInSeconds = planExpireSeconds(settings, { planExpireMarginSeconds: expireMarginSeconds });
      await setPlanJobId(db, run.planId, await createJobQueue(boss).sendPlanRun(run.planId, { expireInSeconds }));
    }
  }
  return taken.map(({ planId, jobId }) => ({ planId, jobId }));
}

/** Sweeps every `everySeconds` until stopped; errors (a database hiccup) are logged and the next sweep tries again. */
export function startSweeper(
  db: Db, boss: PgBoss, o: { staleSeconds: number; everySeconds: number; expireMarginSeconds?: number; log: (line: string) => void },
): () => void {
  const timer = setInterval(() => {
    sweepStalledRuns(db, boss, o.staleSeconds, o.expireMarginSeconds)
      .then((taken) => taken.forEach((t) => o.log(`plan ${t.planId}: worker stopped sending heartbeats; back to the queue`)))
      .catch((err: unknown) => o.log(`plan sweep failed: ${err instanceof Error ? err.message : String(err)}`));
  }, o.everySeconds * 1000);
  timer.unref();
  return () => clearInterval(timer);
}
