// Finds slot searches and campaign plans whose worker died (no heartbeat for a while) and hands them back to the
// queue at once, rather than leaving their progress frozen until pg-boss expires the job (30 minutes). The expiry
// stays as the backstop. Every worker sweeps; the guarded UPDATE lets only one of them take a given row back.
import type PgBoss from 'pg-boss';
import type { Db } from '../../db/client';
import { failUnfinishedCampaign, requeueStalledCampaigns } from '../queries/slots/campaign-rows';
import { failUnfinishedSearch, requeueStalledSearches } from '../queries/slots/search-rows';
import type { SlotSearchJob } from '../services/ports';
import { createJobQueue } from './boss-queue';
import { QUEUES } from './queue';

export type SlotSweepResult = (SlotSearchJob & { jobId: string | null })[];

/**
 * Searches and plannings `running` with a heartbeat older than `staleSeconds` (database clock) go back to `queued`
 * and their job is failed into a retry. A job that is no longer active (a stalled worker that woke up may have
 * completed it, or the row was taken before job ids were stored) gets a fresh job; one whose retries are used up
 * ends the row `failed`, with the reason.
 */
export async function sweepStalledSlotJobs(db: Db, boss: PgBoss, staleSeconds: number): Promise<SlotSweepResult> {
  const taken: SlotSweepResult = [
    ...(await requeueStalledSearches(db, staleSeconds)).map((r) => ({ kind: 'slots' as const, ...r })),
    ...(await requeueStalledCampaigns(db, staleSeconds)).map((r) => ({ kind: 'campaign' as const, ...r })),
  ];
  const reason = `no heartbeat for ${staleSeconds} s: the worker stopped`;
  for (const row of taken) {
    const job = row.jobId ? await boss.getJobById(QUEUES.slotSearch, row.jobId) : null;
    if (job?.state === 'active') {
      // pg-boss turns the failed job into a retry (or, with retries used up, sends it to the dead-letter queue).
      await boss.fail(QUEUES.slotSearch, job.id, { message: reason });
    } else if (job?.state === 'failed') {
      const now = new Date();
      if (row.kind === 'slots') await failUnfinishedSearch(db, row.id, `The search was given up: ${reason}.`, now);
      else await failUnfinishedCampaign(db, row.id, `The planning was given up: ${reason}.`, now);
    } else if (job?.state !== 'created' && job?.state !== 'retry') {
      // The new job's id is stored on the row when a worker takes it.
      const queue = createJobQueue(boss);
      if (queue.sendSlotSearch) await queue.sendSlotSearch({ kind: row.kind, id: row.id });
    }
  }
  return taken;
}

/** Sweeps every `everySeconds` until stopped; errors (a database hiccup) are logged and the next sweep tries again. */
export function startSlotSweeper(
  db: Db, boss: PgBoss, o: { staleSeconds: number; everySeconds: number; log: (line: string) => void },
): () => void {
  const timer = setInterval(() => {
    sweepStalledSlotJobs(db, boss, o.staleSeconds)
      .then((taken) => taken.forEach((t) => {
        o.log(`${t.kind === 'slots' ? 'slot search' : 'campaign'} ${t.id}: worker stopped sending heartbeats; back to the queue`);
      }))
      .catch((err: unknown) => o.log(`slot sweep failed: ${err instanceof Error ? err.message : String(err)}`));
  }, o.everySeconds * 1000);
  timer.unref();
  return () => clearInterval(timer);
}
