// A campaign's scheduling (planner/campaign) in a worker thread of its own, so a campaign plan running in the API
// process (WORKER_IN_PROCESS) never stalls its requests for the search's time (close to a second for the largest
// campaign the form allows). One thread per call: campaign plans are rare, and a thread that ends with its call
// leaves nothing to keep or clean up.
import { join } from 'node:path';
import type { Worker } from 'node:worker_threads';
import type { CampaignSchedule, SlotEngine } from '../services/campaigns/engine';
import { SCHEDULING_STOPPED, type ScheduleRunOptions } from '../services/campaigns/run-schedule';
import { packCampaign, transferablesOf, type PackedCampaign } from './campaign-transfer';
import { startTsThread } from './ts-thread';

const WORKER_FILE = join(__dirname, 'campaign-thread-worker.ts');

/** How often (milliseconds) a running call looks at its job's signal besides at each progress message. */
const SIGNAL_CHECK_EVERY_MS = 50;

export type CampaignThreadInput = { problem: PackedCampaign; options: Omit<ScheduleRunOptions, 'onProgress'> };
export type CampaignThreadMessage =
  | { type: 'progress'; done: number; total: number }
  | { type: 'done'; schedule: CampaignSchedule }
  | { type: 'failed'; message: string };

/**
 * SlotEngine.scheduleCampaign in a new thread: the same schedule as on the calling thread for the same seed, its
 * progress as messages, its errors as a rejection with their message. A stopped job ends the thread at its next
 * progress report or signal check; every call settles only once its thread is gone. `watch` sees each thread as it
 * starts (tests look at it).
 */
export function campaignThreadScheduler(watch?: (thread: Worker) => void): SlotEngine['scheduleCampaign'] {
  return (problem, opts = {}) => {
    const { onProgress, signal, seed, maxIterations } = opts;
    if (signal?.aborted) return Promise.reject(new Error(SCHEDULING_STOPPED));
    const packed = packCampaign(problem);
    const input: CampaignThreadInput = { problem: packed, options: { seed, maxIterations } };
    const worker = startTsThread(WORKER_FILE, input, { transferList: transferablesOf(packed) });
    watch?.(worker);
    return new Promise<CampaignSchedule>((resolve, reject) => {
      let settled = false;
      let signalCheck: ReturnType<typeof setInterval> | undefined;
      const settle = (finish: () => void) => {
        if (settled) return;
        settled = true;
        clearInterval(signalCheck);
        void worker.terminate().finally(finish);
      };
      const fail = (message: string) => settle(() => reject(new Error(message)));
      const checkSignal = () => { if (signal?.aborted) fail(SCHEDULING_STOPPED); };
      if (signal) signalCheck = setInterval(checkSignal, SIGNAL_CHECK_EVERY_MS);
      worker.on('message', (m: CampaignThreadMessage) => {
        if (settled) return;
        if (m.type === 'done') settle(() => resolve(m.schedule));
        else if (m.type === 'failed') fail(`the campaign scheduling failed: ${m.message}`);
        else {
          try {
            onProgress?.(m.done, m.total);
          } catch (err) {
            fail(err instanceof Error ? err.message : String(err));
          }
          checkSignal();
        }
      });
      worker.on('error', (err: Error) => fail(`the campaign scheduling thread crashed: ${err.message}`));
      worker.on('exit', (code) => fail(`the campaign scheduling thread exited (code ${code}) before it finished`));
    });
  };
}

export const threadScheduleCampaign = campaignThreadScheduler();

/** The slot engine with every campaign plan's scheduling in a thread (the slot jobs' engine). */
export function withCampaignThread(engine: SlotEngine): SlotEngine {
  return { ...engine, scheduleCampaign: threadScheduleCampaign };
}
