// Starts a worker thread on one of the server's TypeScript files: the one place that knows how a thread gets to
// load TypeScript, shared by the plan runs, the slot searches' re-maps, the campaigns' scheduling and the upload checks.
import { Worker, type ResourceLimits } from 'node:worker_threads';

/** A module's export, loaded inside the thread and handed to the worker file's `serve`. */
export interface ThreadExport { module: string; name: string }

export interface TsThreadOptions {
  /** exports loaded inside the thread and handed to `serve` in this order */
  args?: readonly ThreadExport[];
  /** buffers of `workerData` that move to the thread instead of being copied */
  transferList?: ArrayBuffer[];
  /** the thread's heap caps (a hostile input then kills the thread, not the process) */
  resourceLimits?: ResourceLimits;
}

/**
 * Loads `workerFile` in a new thread and calls its `serve` export with the `args` exports.
 *
 * WARNING: the thread must compile TypeScript itself (as in planner/workers/worker-pool.ts): under jest it does not
 * inherit tsx's loader and on Node 20 `--import tsx` in execArgv is ignored, so an eval bootstrap registers tsx's
 * require hook before it loads anything. An inspector flag is dropped, since a second thread cannot take its port.
 */
export function startTsThread(workerFile: string, workerData: unknown, options: TsThreadOptions = {}): Worker {
  const { args = [], transferList = [], resourceLimits } = options;
  const loaded = args.map((a) => `require(${JSON.stringify(a.module)})[${JSON.stringify(a.name)}]`).join(', ');
  const bootstrap = `require('tsx/cjs'); require(${JSON.stringify(workerFile)}).serve(${loaded});`;
  return new Worker(bootstrap, {
    eval: true, workerData, transferList, resourceLimits, execArgv: process.execArgv.filter((a) => !a.startsWith('--inspect')),
  });
}
