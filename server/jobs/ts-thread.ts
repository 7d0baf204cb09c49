// Starts a worker thread on one of the server's TypeScript files: the one place that knows how a thread gets to
// load TypeScript, shared by the plan runs, the slot searches' re-maps and the campaigns' scheduling.
import { Worker } from 'node:worker_threads';

/** A module's export, loaded inside the thread and handed to the worker file's `serve`. */
export interface ThreadExport { module: string; name: string }

/**
 * Loads `workerFile` in a new thread and calls its `serve` export with `args` (each loaded in the thread).
 * `transferList` names buffers of `workerData` that move to the thread instead of being copied.
 *
 * WARNING: the thread must compile TypeScript itself (as in planner/workers/worker-pool.ts): under jest it does not
 * inherit tsx's loader and on Node 20 `--import tsx` in execArgv is ignored, so an eval bootstrap registers tsx's
 * require hook before it loads anything. An inspector flag is dropped, since a second thread cannot take its port.
 */
export function startTsThread(
  workerFile: string, workerData: unknown, args: readonly ThreadExport[] = [], transferList: ArrayBuffer[] = [],
): Worker {
  const loaded = args.map((a) => `require(${JSON.stringify(a.module)})[${JSON.stringify(a.name)}]`).join(', ');
  const bootstrap = `require('tsx/cjs'); require(${JSON.stringify(workerFile)}).serve(${loaded});`;
  return new Worker(bootstrap, {
    eval: true, workerData, transferList, execArgv: process.execArgv.filter((a) => !a.startsWith('--inspect')),
  });
}
