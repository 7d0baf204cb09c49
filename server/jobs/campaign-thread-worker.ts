// Inside a campaign's scheduling thread: unpacks workerData's problem and schedules it once, posting the search's
// progress, then the schedule or the error's message.
import { parentPort, workerData } from 'node:worker_threads';
import { runSchedule } from '../services/campaigns/run-schedule';
import type { CampaignThreadInput, CampaignThreadMessage } from './campaign-thread';
import { unpackCampaign } from './campaign-transfer';

/** Called by the bootstrap in ts-thread.ts once tsx is registered. */
export function serve(): void {
  const port = parentPort;
  if (!port) throw new Error('campaign-thread-worker runs only inside a worker thread');
  const send = (m: CampaignThreadMessage) => port.postMessage(m);
  const { problem, options } = workerData as CampaignThreadInput;
  try {
    const schedule = runSchedule(unpackCampaign(problem), { ...options, onProgress: (done, total) => send({ type: 'progress', done, total }) });
    send({ type: 'done', schedule });
  } catch (err) {
    send({ type: 'failed', message: err instanceof Error ? err.message : String(err) });
  }
}
