// Job-queue helpers for server tests: pg-boss on the test database in a schema of its own (so parallel test
// files never take each other's jobs), optionally with the plan worker; or a queue that only records calls.
import { randomUUID } from 'node:crypto';
import type PgBoss from 'pg-boss';
import { createDb } from '../../../db/client';
import type { ServerConfig } from '../../../server/env';
import { startBoss } from '../../../server/jobs/boss';
import { createJobQueue } from '../../../server/jobs/boss-queue';
import { registerPlanWorker, type PlanWorker } from '../../../server/jobs/plan-worker';
import type { JobQueue, MailJob } from '../../../server/jobs/queue';
import { dropTestSchema } from './drop-schema';

export type TestJobs = {
  jobs: JobQueue;
  boss: PgBoss;
  schema: string;
  /** the plan worker when `workers` was asked for (stop() it alone to simulate a worker's shutdown) */
  worker: PlanWorker | null;
  /** stops the worker and pg-boss and drops the schema */
  stop(): Promise<void>;
};

export type TestJobsOptions = {
  /** register the plan-run worker (and its dead-letter handler) on this queue */
  workers?: boolean;
  /** default: a fresh `jobs_<random>` schema, dropped by stop() */
  schema?: string;
  /** a stand-in for server/jobs/plan-compute.ts (absolute path of a module exporting computePlan) */
  computeModule?: string;
  /** worker log lines (default: dropped) */
  log?: (line: string) => void;
  /** the worker's heartbeat staleness limit (default: the worker's own, 30 s) */
  heartbeatStaleSeconds?: number;
};

export async function startTestJobs(config: ServerConfig, opts: TestJobsOptions = {}): Promise<TestJobs> {
  const schema = opts.schema ?? `jobs_${randomUUID().replace(/-/g, '').slice(0, 12)}`;
  const log = opts.log ?? (() => undefined);
  const boss = await startBoss(config, { schema, log });
  let worker: PlanWorker | null = null;
  const { db, pool } = createDb(config.databaseUrl, { max: 4 });
  if (opts.workers) {
    // Short polling keeps the tests quick; production polls every second.
    worker = await registerPlanWorker(boss, { db, log, computeModule: opts.computeModule, pollingIntervalSeconds: 0.5, heartbeatStaleSeconds: opts.heartbeatStaleSeconds });
  }
  let stopped: Promise<void> | null = null;
  const stop = () => {
    stopped ??= (async () => {
      await worker?.stop();
      await boss.stop({ graceful: true, timeout: 2000 });
      await pool.end();
      await dropTestSchema(config.databaseUrl, schema);
    })();
    return stopped;
  };
  return { jobs: createJobQueue(boss), boss, schema, worker, stop };
}

export type RecordingQueue = JobQueue & {
  planRuns: { planId: string; expireInSeconds: number; jobId: string }[];
  cancelled: string[];
  mails: MailJob[];
  /** set it to make sendPlanRun throw like a queue that is down */
  failing: boolean;
};

/** A JobQueue that records what was asked of it and runs nothing; job ids are `job-1`, `job-2`, … */
export function createRecordingQueue(): RecordingQueue {
  let next = 0;
  const q: RecordingQueue = {
    planRuns: [], cancelled: [], mails: [], failing: false,
    isRunning: () => !q.failing,
    async sendPlanRun(planId, { expireInSeconds }) {
      if (q.failing) throw new Error('connection refused');
      const jobId = `job-${++next}`;
      q.planRuns.push({ planId, expireInSeconds, jobId });
      return jobId;
    },
    async cancelPlanRun(jobId) {
      q.cancelled.push(jobId);
    },
    async sendMail(job) {
      q.mails.push(job);
      return `job-${++next}`;
    },
  };
  return q;
}
