// A slot search's quick re-maps in a worker thread of their own, so a search or a campaign plan running in the API
// process (WORKER_IN_PROCESS) never stalls its requests for a re-map's whole time limit. One thread per search:
// it gets the scenario once, builds the inventory once, and answers each re-map by message. The thread starts on
// the first re-map the caches cannot answer, so a search they answer entirely costs no thread.
import { join } from 'node:path';
import type { Worker } from 'node:worker_threads';
import type { SlotEngine } from '../services/campaigns/engine';
import type { QuickRemapper, QuickRemapperFactory, RemapRequest } from '../services/slots/quick-remap';
import type { RemapAnswer } from '../services/slots/remap-cache';
import { startTsThread } from './ts-thread';

const WORKER_FILE = join(__dirname, 'slot-remap-thread-worker.ts');

export type RemapThreadRequest = { id: number; request: RemapRequest };
export type RemapThreadReply =
  | { type: 'busy'; id: number }
  | { type: 'done'; id: number; answer: RemapAnswer }
  | { type: 'failed'; id: number; message: string };

type Pending = { resolve: (a: RemapAnswer) => void; reject: (e: Error) => void; onBusy?: () => void };

/** The thread loads TypeScript as every server thread does (ts-thread.ts). */
export const threadRemapper: QuickRemapperFactory = (scenario): QuickRemapper => {
  const pending = new Map<number, Pending>();
  let nextId = 1;
  let worker: Worker | null = null;
  let closed = false;

  const failAll = (message: string) => {
    for (const p of pending.values()) p.reject(new Error(message));
    pending.clear();
    worker = null;
  };

  const start = (): Worker => {
    const w = startTsThread(WORKER_FILE, { scenario });
    w.on('message', (m: RemapThreadReply) => {
      const p = pending.get(m.id);
      if (!p) return;
      if (m.type === 'busy') {
        p.onBusy?.();
        return;
      }
      pending.delete(m.id);
      if (m.type === 'done') p.resolve(m.answer);
      else p.reject(new Error(`the quick re-map failed: ${m.message}`));
    });
    // A crashed thread fails what it was asked; the next re-map starts a new one. Only the current thread's end
    // settles requests: a crashed one's late 'exit' must not fail its successor's.
    w.on('error', (err: Error) => { if (worker === w) failAll(`the quick re-map thread crashed: ${err.message}`); });
    w.on('exit', (code) => {
      if (worker !== w) return;
      failAll(closed ? 'the quick re-map thread was closed before it answered'
        : `the quick re-map thread exited (code ${code}) before it answered`);
    });
    return w;
  };

  return {
    remap(request, onBusy) {
      if (closed) return Promise.reject(new Error('the quick re-map thread is closed'));
      worker ??= start();
      const id = nextId++;
      const answer = new Promise<RemapAnswer>((resolve, reject) => pending.set(id, { resolve, reject, onBusy }));
      worker.postMessage({ id, request } satisfies RemapThreadRequest);
      return answer;
    },
    async close() {
      closed = true;
      const w = worker;
      if (!w) return;
      await w.terminate();
      // terminate() may resolve before the 'exit' event: settle anything still waiting now.
      if (worker === w) failAll('the quick re-map thread was closed before it answered');
    },
  };
};

/** The slot engine with every search's and campaign plan's re-maps in a thread (unless the caller chose one). */
export function withRemapThreads(engine: SlotEngine): SlotEngine {
  return {
    ...engine,
    findSlots: (db, request, opts) => engine.findSlots(db, request, { ...opts, remapper: opts.remapper ?? threadRemapper }),
    findSlotsForGroups: (db, timing, groups, opts) =>
      engine.findSlotsForGroups(db, timing, groups, { ...opts, remapper: opts.remapper ?? threadRemapper }),
  };
}
