// A small pool of long-lived remap workers with request/reply messaging. Workers keep state (the loaded
// problem, an island), so each request goes to a chosen worker rather than to whichever is free.
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import type { WorkerReply, WorkerRequest } from './worker-protocol';

const WORKER_FILE = join(__dirname, 'remap-worker.ts');

/**
 * WARNING: the worker must compile TypeScript itself. Under jest it does not inherit tsx's loader, and on
 * Node 20 an `--import tsx` in a worker's execArgv is silently ignored (checked here: ".ts unknown file
 * extension"), so a tiny CommonJS bootstrap registers tsx's require hook and then loads the worker file.
 * Inspector flags are dropped so a debugged parent does not clash on the port.
 */
function startWorker(): Worker {
  const bootstrap = `require('tsx/cjs'); require(${JSON.stringify(WORKER_FILE)});`;
  return new Worker(bootstrap, { eval: true, execArgv: process.execArgv.filter((a) => !a.startsWith('--inspect')) });
}

interface Pending {
  resolve: (v: unknown) => void;
  reject: (e: Error) => void;
}

class RemapWorker {
  private readonly worker: Worker;
  private readonly pending = new Map<number, Pending>();
  private nextId = 0;
  exited = false;

  constructor() {
    this.worker = startWorker();
    this.worker.on('message', (reply: WorkerReply) => {
      const p = this.pending.get(reply.id);
      if (!p) return;
      this.pending.delete(reply.id);
      if (reply.ok) p.resolve(reply.value);
      else p.reject(new Error(reply.message));
    });
    const failAll = (err: Error) => {
      for (const p of this.pending.values()) p.reject(err);
      this.pending.clear();
    };
    this.worker.on('error', failAll);
    this.worker.on('exit', (code) => {
      this.exited = true;
      failAll(new Error(`remap worker exited with code ${code}`));
    });
  }

  request<T>(req: WorkerRequest): Promise<T> {
    const id = this.nextId++;
    return new Promise<T>((resolve, reject) => {
      this.pending.set(id, { resolve: resolve as (v: unknown) => void, reject });
      this.worker.postMessage({ id, req });
    });
  }

  /** An idle worker must not keep the process alive if a caller forgets close(). */
  hold(busy: boolean): void {
    if (busy) this.worker.ref();
    else this.worker.unref();
  }

  async terminate(): Promise<void> {
    await this.worker.terminate();
    this.exited = true;
  }
}

export class WorkerPool {
  private workers: RemapWorker[] = [];

  /** At least `count` workers, started on demand and reused across runs. */
  take(count: number): RemapWorker[] {
    while (this.workers.length < count) {
      const w = new RemapWorker();
      this.workers.push(w);
      this.all.push(w);
    }
    const taken = this.workers.slice(0, count);
    for (const w of taken) w.hold(true);
    return taken;
  }

  release(): void {
    for (const w of this.workers) w.hold(false);
  }

  private all: RemapWorker[] = [];

  /** Threads started by this pool that have not exited yet. */
  live(): number {
    return this.all.filter((w) => !w.exited).length;
  }

  async close(): Promise<void> {
    const workers = this.workers;
    this.workers = [];
    await Promise.all(workers.map((w) => w.terminate()));
  }
}

export type { RemapWorker };
