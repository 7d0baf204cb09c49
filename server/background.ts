// Background services the server process runs besides HTTP: the job queue (pg-boss), its workers when
// WORKER_IN_PROCESS is on, and the local SMTP sink when SMTP_URL=sink. `npm run worker` uses startWorkers alone.
import type PgBoss from 'pg-boss';
import type { Db } from '../db/client';
import type { ServerConfig } from './env';
import { createJobQueue } from './jobs/boss-queue';
import { startBoss } from './jobs/boss';
import { withCampaignThread } from './jobs/campaign-thread';
import { registerPlanWorker } from './jobs/plan-worker';
import { withRemapThreads } from './jobs/slot-remap-thread';
import { registerSlotWorker } from './jobs/slot-worker';
import type { JobQueue } from './jobs/queue';
import { startSinkIfConfigured } from './mail/start-sink';
import { registerMailWorker } from './mail/worker';
import { surviveDatabaseOutages } from './outage-guard';
import { slotEngine } from './services/campaigns/slot-engine';

export interface Background {
  jobs: JobQueue;
  /** stops workers, the queue and the sink; safe to call twice */
  stop(): Promise<void>;
}

export type BackgroundDeps = { db: Db; config: ServerConfig; log?: (line: string) => void };

/** How long stop() lets pg-boss finish its own bookkeeping (running plan threads are stopped before). */
const BOSS_STOP_TIMEOUT_MS = 10_000;

type Stopper = () => Promise<void>;

/** The job handlers of this process; each returns its stop function. */
async function registerWorkers(boss: PgBoss, deps: BackgroundDeps, sinkPort?: number): Promise<Stopper[]> {
  const plans = await registerPlanWorker(boss, {
    db: deps.db, log: deps.log,
    heartbeatStaleSeconds: deps.config.planHeartbeatStaleSeconds, expireMarginSeconds: deps.config.planExpireMarginSeconds,
  });
  // Slot searches' quick re-maps run in a thread per search, and a campaign's scheduling in a thread per plan, so
  // neither stalls the API sharing this process.
  const slots = await registerSlotWorker(boss, { db: deps.db, engine: withCampaignThread(withRemapThreads(slotEngine)), log: deps.log });
  const stoppers: Stopper[] = [() => plans.stop(), () => slots.stop()];
  // Mail: to the in-process sink's actual port when there is one, else as configured.
  const mail = await registerMailWorker(boss, { db: deps.db, config: deps.config, sinkPort });
  stoppers.push(() => mail.stop());
  return stoppers;
}

/** Stops in order: workers first (a running plan goes back to the queue), then pg-boss; runs once. */
function stopOnce(boss: PgBoss, stoppers: Stopper[]): () => Promise<void> {
  let stopping: Promise<void> | null = null;
  return () => {
    stopping ??= (async () => {
      for (const stop of stoppers) await stop().catch(() => undefined);
      await boss.stop({ graceful: true, timeout: BOSS_STOP_TIMEOUT_MS });
    })();
    return stopping;
  };
}

/** Starts pg-boss and runs `setUp`, which adds what stop() stops (in list order); a failed set-up stops it all. */
async function withBoss(deps: BackgroundDeps, setUp: (boss: PgBoss, stoppers: Stopper[]) => Promise<void>): Promise<Background> {
  // The server and `npm run worker` both come through here: neither may end over a database outage.
  surviveDatabaseOutages(deps.log);
  const boss = await startBoss(deps.config, { log: deps.log });
  const stoppers: Stopper[] = [];
  const stop = stopOnce(boss, stoppers);
  try {
    await setUp(boss, stoppers);
  } catch (err) {
    await stop();
    throw err;
  }
  return { jobs: createJobQueue(boss), stop };
}

/** For the API process: the queue routes send to, plus the workers when config.workerInProcess. */
export function startBackground(deps: BackgroundDeps): Promise<Background> {
  return withBoss(deps, async (boss, stoppers) => {
    // SMTP sink: before the workers, so the mail worker is given the port the sink got.
    const sink = await startSinkIfConfigured(deps.config, deps.db, deps.log);
    if (sink) stoppers.push(() => sink.stop());
    if (deps.config.workerInProcess) stoppers.unshift(...(await registerWorkers(boss, deps, sink?.port)));
  });
}

/** For `npm run worker`: the same job handlers, with no HTTP. */
export function startWorkers(deps: BackgroundDeps): Promise<Background> {
  return withBoss(deps, async (boss, stoppers) => {
    stoppers.push(...(await registerWorkers(boss, deps)));
  });
}
