// The ParallelRunner behind planWindow's 'islands' and 'shared-eval' modes: a worker-thread pool that
// rebuilds the window's problem in every worker, then runs the chosen mode. Call close() when done.
import { InvalidOptionError } from '../errors';
import type { ParallelRunInput, ParallelRunner, ParallelRunResult } from '../remap/parallel-runner';
import { runIslands } from './islands';
import { runSharedEval } from './shared-eval';
import { WorkerPool } from './worker-pool';
import type { ProblemShape } from './worker-protocol';

export interface WorkerParallelRunner extends ParallelRunner {
  close(): Promise<void>;
  /** worker threads started and not yet ended (0 after close) */
  liveWorkers(): number;
}

export function createParallelRunner(): WorkerParallelRunner {
  const pool = new WorkerPool();
  let running = false;
  return {
    async run(input: ParallelRunInput): Promise<ParallelRunResult> {
      if (input.mode !== 'islands' && input.mode !== 'shared-eval') throw new InvalidOptionError(`unknown parallel mode "${String(input.mode)}"`);
      if (!Number.isInteger(input.workers) || input.workers < 1) throw new InvalidOptionError('workers must be an integer ≥ 1');
      // One run at a time: workers hold per-run state (the loaded problem, an island).
      if (running) throw new InvalidOptionError('this parallel runner is already running a plan');
      running = true;
      try {
        const workers = pool.take(input.workers);
        const load = { kind: 'load' as const, scenario: input.scenario, window: input.window, problemOptions: input.problemOptions };
        const shapes = await Promise.all(workers.map((w) => w.request<ProblemShape>(load)));
        return input.mode === 'islands' ? await runIslands(input, workers) : await runSharedEval(input, workers, shapes[0]);
      } finally {
        pool.release();
        running = false;
      }
    },
    close: () => pool.close(),
    liveWorkers: () => pool.live(),
  };
}

/** Runs `fn` with a fresh runner and always closes it (no worker left behind). */
export async function withParallelRunner<T>(fn: (runner: WorkerParallelRunner) => Promise<T>): Promise<T> {
  const runner = createParallelRunner();
  try {
    return await fn(runner);
  } finally {
    await runner.close();
  }
}
