// Runs computePlan in a worker thread, so a plan run never blocks the event loop of the process hosting it
// (the API answers requests while a run computes), and a cancelled run can be stopped at once.
import { join } from 'node:path';
import type { PlanProgress, PlanReview } from '../../shared/plans';
import type { PlanThreadInput, ThreadError, ThreadMessage } from './plan-thread-protocol';
import { startTsThread } from './ts-thread';

export const PLAN_COMPUTE_MODULE = join(__dirname, 'plan-compute.ts');
const WORKER_FILE = join(__dirname, 'plan-thread-worker.ts');

export type ThreadOutcome = { kind: 'done'; review: PlanReview } | { kind: 'failed'; error: ThreadError };

export interface PlanThread {
  /** settles once: the review, or why it failed (never rejects) */
  outcome: Promise<ThreadOutcome>;
  terminate(): Promise<void>;
}

/**
 * The thread (started as every server thread is, ts-thread.ts) loads the compute module and hands its computePlan
 * to the worker file. `computeModule` is an absolute path exporting `computePlan`; tests pass a stand-in.
 */
export function startPlanThread(
  input: PlanThreadInput,
  onProgress: (p: PlanProgress) => void,
  opts: { computeModule?: string } = {},
): PlanThread {
  const computeModule = opts.computeModule ?? PLAN_COMPUTE_MODULE;
  const worker = startTsThread(WORKER_FILE, input, { args: [{ module: computeModule, name: 'computePlan' }] });
  const outcome = new Promise<ThreadOutcome>((resolve) => {
    const crash = (message: string) => resolve({ kind: 'failed', error: { deterministic: false, code: null, message } });
    worker.on('message', (m: ThreadMessage) => {
      if (m.type === 'progress') onProgress(m.progress);
      else if (m.type === 'done') resolve({ kind: 'done', review: m.review });
      else resolve({ kind: 'failed', error: m.error });
    });
    worker.on('error', (err: Error) => crash(`the plan thread crashed: ${err.message}`));
    worker.on('exit', (code) => crash(`the plan thread exited (code ${code}) before it finished`));
  });
  // Once settled the thread has nothing left to do; stopping it also stops any island threads it started.
  void outcome.then(() => worker.terminate());
  return { outcome, terminate: async () => { await worker.terminate(); } };
}
