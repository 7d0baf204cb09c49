// Registers the plan-run worker and its dead-letter handler on a started pg-boss; stop() ends running threads.
import type PgBoss from 'pg-boss';
import type { Db } from '../../db/client';
import type { PlanRunJobData } from './boss-queue';
import { markDeadRun } from './plan-dead-letter';
import { runPlanJob } from './plan-run-handler';
import { startSweeper } from './plan-sweeper';
import type { StopReason } from './plan-run-watch';
import { QUEUES } from './queue';

export type PlanWorkerOptions = {
  db: Db;
  log?: (line: string) => void;
  computeModule?: string;
  /** how often an idle worker asks for a job (pg-boss polling; minimum 0.5) */
  pollingIntervalSeconds?: number;
  /** a run without a heartbeat for this long is handed back to the queue (default 30 s) */
  heartbeatStaleSeconds?: number;
  /** PLAN_EXPIRE_MARGIN_SECONDS, for a job the sweep has to send afresh (default 120) */
  expireMarginSeconds?: number;
};

export interface PlanWorker {
  /** no new runs; running ones stop their threads and go back to the queue (retried elsewhere) */
  stop(): Promise<void>;
}

export async function registerPlanWorker(boss: PgBoss, opts: PlanWorkerOptions): Promise<PlanWorker> {
  const log = opts.log ?? (() => undefined);
  const stoppers = new Set<(reason: StopReason) => void>();
  let stopping = false;
  const running = new Set<Promise<void>>();
  const pollingIntervalSeconds = opts.pollingIntervalSeconds ?? 1;
  // batchSize 1 (the default): one run at a time per process; a run already uses the cores it is given
  // (islands mode starts its own threads), and more processes share the queue through the database.
  await boss.work<PlanRunJobData>(QUEUES.planRun, { pollingIntervalSeconds }, async (jobs) => {
    for (const job of jobs) {
      let mine: ((reason: StopReason) => void) | null = null;
      const onStopper = (stop: ((reason: StopReason) => void) | null) => {
        if (mine) stoppers.delete(mine);
        mine = stop;
        if (stop) stoppers.add(stop);
        // A run that reached its thread after stop() began is stopped at once.
        if (stop && stopping) stop('shutdown');
      };
      const run = runPlanJob({ db: opts.db, log, computeModule: opts.computeModule, onStopper }, job);
      const tracked = run.then(() => undefined, () => undefined);
      running.add(tracked);
      try {
        await run;
      } finally {
        running.delete(tracked);
      }
    }
  });
  await boss.work<{ planId?: string }>(QUEUES.planRunDead, { pollingIntervalSeconds, includeMetadata: true }, async (jobs) => {
    for (const job of jobs) await markDeadRun(opts.db, job, log);
  });
  const staleSeconds = opts.heartbeatStaleSeconds ?? 30;
  // Heartbeats are written every half second; sweeping at a third of the stale time keeps recovery prompt.
  const stopSweeper = startSweeper(opts.db, boss, {
    staleSeconds, everySeconds: Math.max(1, Math.floor(staleSeconds / 3)), expireMarginSeconds: opts.expireMarginSeconds, log,
  });
  return {
    async stop() {
      stopping = true;
      stopSweeper();
      await boss.offWork(QUEUES.planRun);
      await boss.offWork(QUEUES.planRunDead);
      for (const stop of stoppers) stop('shutdown');
      await Promise.all(running);
    },
  };
}
