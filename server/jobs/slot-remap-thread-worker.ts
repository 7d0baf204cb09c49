// Inside a slot search's re-map thread: builds the inventory from workerData's scenario once, then answers
// re-map requests one at a time, with progress pings while one computes and its error when it fails.
import { parentPort, workerData } from 'node:worker_threads';
import { buildInventory } from '../../planner/model/build-inventory';
import type { Scenario } from '../../shared/scenario';
import { quickRemap } from '../services/slots/quick-remap';
import type { RemapThreadReply, RemapThreadRequest } from './slot-remap-thread';

/** Progress pings at most this often (milliseconds); the search's own reports are rarer still. */
const PING_EVERY_MS = 100;

/** Called by the eval bootstrap in slot-remap-thread.ts once tsx is registered. */
export function serve(): void {
  const port = parentPort;
  if (!port) throw new Error('slot-remap-thread-worker runs only inside a worker thread');
  const scenario = (workerData as { scenario: Scenario }).scenario;
  const inventory = buildInventory(scenario);
  const send = (m: RemapThreadReply) => port.postMessage(m);
  let queue = Promise.resolve();
  const answer = async ({ id, request }: RemapThreadRequest) => {
    let lastPing = -Infinity;
    const ping = () => {
      const nowMs = Date.now();
      if (nowMs - lastPing < PING_EVERY_MS) return;
      lastPing = nowMs;
      send({ type: 'busy', id });
    };
    try {
      send({ type: 'done', id, answer: await quickRemap(scenario, inventory, request, ping) });
    } catch (err) {
      send({ type: 'failed', id, message: err instanceof Error ? err.message : String(err) });
    }
  };
  port.on('message', (m: RemapThreadRequest) => { queue = queue.then(() => answer(m)); });
}
