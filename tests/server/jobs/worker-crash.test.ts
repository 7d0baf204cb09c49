// A stand-alone worker killed with SIGKILL in the middle of a run: the job expires, the queue retries it and a
// freshly started worker completes the run (DESIGN §5: a run survives a worker crash).
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { createDb } from '../../../db/client';
import { planReviewSchema } from '../../../shared/plans';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { demoConfig, insertQueuedPlan, readPlan, waitFor } from './helpers/demo-db';

const ROOT = path.resolve(__dirname, '../../..');
// w-12 takes an edge site down: the search and then the reference solvers keep a run busy for a few seconds.
const WINDOW = 'w-12';
/**
 * Shorter than planExpireSeconds() would give (its 60 s of set-up headroom would make this test wait a minute):
 * the mechanism is the same, and a run of this window takes a few seconds.
 */
const EXPIRE_SECONDS = 15;

type Worker = { child: ChildProcess; output: string[] };

describe('a worker killed mid-run', () => {
  let jobs: TestJobs;
  let env: NodeJS.ProcessEnv;
  const started: Worker[] = [];

  function startWorker(): Worker {
    // One process (node + tsx's loader, no tsx CLI parent) in a group of its own, so SIGKILL hits the worker itself.
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker.ts'], {
      cwd: ROOT, env, detached: true, stdio: ['ignore', 'pipe', 'pipe'],
    });
    const w: Worker = { child, output: [] };
    child.stdout!.on('data', (d: Buffer) => w.output.push(d.toString()));
    child.stderr!.on('data', (d: Buffer) => w.output.push(d.toString()));
    started.push(w);
    return w;
  }

  function killHard(w: Worker): Promise<void> {
    return new Promise((resolve) => {
      if (w.child.exitCode !== null || w.child.signalCode !== null) return resolve();
      w.child.once('exit', () => resolve());
      process.kill(-w.child.pid!, 'SIGKILL');
    });
  }

  beforeAll(async () => {
    const config = await demoConfig({ PLAN_EXPIRE_MARGIN_SECONDS: '2', JOB_MAINTENANCE_SECONDS: '1' });
    jobs = await startTestJobs(config);
    env = {
      ...process.env, DATABASE_URL: config.databaseUrl, JOB_SCHEMA: jobs.schema, NODE_ENV: 'test',
      PLAN_EXPIRE_MARGIN_SECONDS: '2', JOB_MAINTENANCE_SECONDS: '1', SMTP_SINK_PORT: '0', WORKER_IN_PROCESS: 'true',
    };
  });
  afterAll(async () => {
    for (const w of started) await killHard(w);
    await jobs?.stop();
  });

  test('the run is retried and completed by a new worker', async () => {
    const config = await demoConfig();
    const { db, pool } = createDb(config.databaseUrl, { max: 2 });
    try {
      const planId = await insertQueuedPlan(db, WINDOW, { timeLimitSeconds: 3, seed: 3 });
      await jobs.jobs.sendPlanRun(planId, { expireInSeconds: EXPIRE_SECONDS });
      const first = startWorker();
      // Killed while its thread is searching (progress past `preparing`), not merely after it took the job.
      const taken = await waitFor('the first worker to be computing', async () => {
        const row = await readPlan(db, planId);
        const phase = (row.progress as { phase?: string } | null)?.phase;
        return row.status === 'running' && row.attempts === 1 && phase !== undefined && phase !== 'preparing' ? row : undefined;
      }, 45_000).catch(async (err: Error) => {
        const row = await readPlan(db, planId);
        throw new Error(`${err.message}; plan ${row.status}, attempts ${row.attempts}, progress ${JSON.stringify(row.progress)}; `
          + `worker output:\n${first.output.join('')}`);
      });
      await killHard(first);
      const killedAt = Date.now();
      expect((await readPlan(db, planId)).status).toBe('running');

      const second = startWorker();
      const done = await waitFor('the retried run to finish', async () => {
        const row = await readPlan(db, planId);
        return row.status === 'done' || row.status === 'failed' ? row : undefined;
      }, 60_000);
      expect(done.error).toBeNull();
      expect(done.status).toBe('done');
      expect(done.attempts).toBeGreaterThanOrEqual(2);
      expect(planReviewSchema.safeParse(done.result).success).toBe(true);
      // Not before the job's expiry: until then the queue cannot tell a dead worker from a slow one.
      const retryAfterMs = done.startedAt!.getTime() - taken.startedAt!.getTime();
      expect(retryAfterMs).toBeGreaterThanOrEqual((EXPIRE_SECONDS - 1) * 1000);
      if (process.env.JOBS_TEST_TIMINGS) {
        console.log(`killed ${killedAt - taken.startedAt!.getTime()} ms after start; retry started ${retryAfterMs} ms after `
          + `the first start; done ${done.finishedAt!.getTime() - killedAt} ms after the kill`);
      }
      const log = second.output.join('');
      expect(log).toMatch(new RegExp(`plan run ${planId}: window ${WINDOW}, attempt [23], .*done`));
      expect(first.output.join('')).not.toMatch(/done/);
    } finally {
      await pool.end();
    }
  });
});
