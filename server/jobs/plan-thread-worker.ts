// Inside the worker thread: runs computePlan on workerData and reports progress and the outcome to the parent.
import { parentPort, workerData } from 'node:worker_threads';
import { PlannerError } from '../../planner/errors';
import type { ComputePlanFn, PlanThreadInput, ThreadError, ThreadMessage } from './plan-thread-protocol';

function describe(err: unknown): ThreadError {
  if (err instanceof PlannerError) return { deterministic: true, code: err.code, message: err.message };
  // zod's errors (a scenario or settings the planner cannot read) fail the same way on every attempt.
  if (err instanceof Error && err.name === 'ZodError') return { deterministic: true, code: 'INVALID_INPUT', message: err.message };
  return { deterministic: false, code: null, message: err instanceof Error ? err.message : String(err) };
}

/** Called by the eval bootstrap in plan-thread.ts with the compute module it loaded. */
export function serve(computePlan: ComputePlanFn): void {
  const port = parentPort;
  if (!port) throw new Error('plan-thread-worker runs only inside a worker thread');
  const send = (m: ThreadMessage) => port.postMessage(m);
  computePlan(workerData as PlanThreadInput, (progress) => send({ type: 'progress', progress }))
    .then((review) => send({ type: 'done', review }))
    .catch((err: unknown) => send({ type: 'failed', error: describe(err) }));
}
