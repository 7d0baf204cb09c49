// Registers the slot-search worker (slot searches and campaign plans) and its dead-letter handler on a started
// pg-boss, beside the plan worker, and sweeps back rows whose worker died (slot-sweeper.ts); stop() makes running
// searches give up and go back to the queue.
import type PgBoss from 'pg-boss';
import type { Db } from '../../db/client';
import type { SlotEngine } from '../services/campaigns/engine';
import type { SlotSearchJob } from '../services/ports';
import { QUEUES } from './queue';
import { markDeadSlotJob } from './slot-dead-letter';
import { runSlotJob } from './slot-search-handler';
import { startSlotSweeper } from './slot-sweeper';

export type SlotWorkerOptions = {
  db: Db;
  engine: SlotEngine;
  log?: (line: string) => void;
  /** how often an idle worker asks for a job (pg-boss polling; minimum 0.5) */
  pollingIntervalSeconds?: number;
  /** the searches' "now"; default the clock */
  now?: () => Date;
  /** a search or campaign plan without a heartbeat for this long is handed back to the queue (default 30 s) */
  heartbeatStaleSeconds?: number;
};

export interface SlotWorker {
  stop(): Promise<void>;
}

export async function registerSlotWorker(boss: PgBoss, opts: SlotWorkerOptions): Promise<SlotWorker> {
  const log = opts.log ?? (() => undefined);
  const stopping = { aborted: false };
  const running = new Set<Promise<void>>();
  const pollingIntervalSeconds = opts.pollingIntervalSeconds ?? 1;
  // One search at a time per process: a search keeps its process's CPU busy with quick re-maps.
  await boss.work<SlotSearchJob>(QUEUES.slotSearch, { pollingIntervalSeconds }, async (jobs) => {
    for (const job of jobs) {
      const run = runSlotJob({ db: opts.db, engine: opts.engine, log, now: opts.now, stopping }, job);
      const tracked = run.then(() => undefined, () => undefined);
      running.add(tracked);
      try {
        await run;
      } finally {
        running.delete(tracked);
      }
    }
  });
  await boss.work<Partial<SlotSearchJob>>(QUEUES.slotSearchDead, { pollingIntervalSeconds, includeMetadata: true }, async (jobs) => {
    for (const job of jobs) await markDeadSlotJob(opts.db, job, log);
  });
  const staleSeconds = opts.heartbeatStaleSeconds ?? 30;
  // Progress (the heartbeat) is written about every half second; sweeping at a third of the stale time keeps
  // recovery prompt.
  const stopSweeper = startSlotSweeper(opts.db, boss, { staleSeconds, everySeconds: Math.max(1, Math.floor(staleSeconds / 3)), log });
  return {
    async stop() {
      stopping.aborted = true;
      stopSweeper();
      await boss.offWork(QUEUES.slotSearch);
      await boss.offWork(QUEUES.slotSearchDead);
      await Promise.all(running);
    },
  };
}
