// Graceful stop: the API server, run as its own process, gets SIGTERM while a request is in progress (the request
// completes, new connections are refused, the process exits 0) and while a plan run computes (the run goes back to
// the queue and a server started afterwards finishes it).
import { spawn, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import net from 'node:net';
import path from 'node:path';
import { createDb } from '../../../db/client';
import { startTestJobs, type TestJobs } from '../helpers/jobs';
import { demoConfig, insertQueuedPlan, readPlan, waitFor } from '../jobs/helpers/demo-db';
import { freePort } from '../helpers/free-port';

const ROOT = path.resolve(__dirname, '../../..');
// w-12 takes an edge site down: the search and then the reference solvers keep a run busy for a few seconds.
const WINDOW = 'w-12';

type Server = { child: ChildProcess; port: number; output: string[]; exited: Promise<number | null> };

let jobs: TestJobs;
let baseEnv: NodeJS.ProcessEnv;
const started: Server[] = [];

beforeAll(async () => {
  const config = await demoConfig();
  // A queue schema of this file's own (dropped afterwards); the servers started below work the same one.
  jobs = await startTestJobs(config);
  baseEnv = {
    ...process.env, DATABASE_URL: config.databaseUrl, JOB_SCHEMA: jobs.schema, NODE_ENV: 'test', HOST: '127.0.0.1',
    WORKER_IN_PROCESS: 'true', SMTP_SINK_PORT: '0', WEB_DIST: '/nonexistent-web-dist', LOG_FORMAT: 'json', LOG_LEVEL: 'info',
    SHUTDOWN_GRACE_SECONDS: '10', OIDC_ISSUER_PORT: 'off',
  };
});
afterAll(async () => {
  for (const s of started) if (s.child.exitCode === null && s.child.signalCode === null) s.child.kill('SIGKILL');
  await Promise.all(started.map((s) => s.exited));
  await jobs?.stop();
});

/** Starts server/index.ts as one node process (no tsx CLI in between, so signals reach it) and waits until it listens. */
async function startServer(): Promise<Server> {
  const port = await freePort();
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT, env: { ...baseEnv, PORT: String(port) }, stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  child.stdout!.on('data', (d: Buffer) => output.push(d.toString()));
  child.stderr!.on('data', (d: Buffer) => output.push(d.toString()));
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  const server = { child, port, output, exited };
  started.push(server);
  await waitFor('the server to listen', async () => (output.join('').includes('Slackwater listening on') ? true : undefined), 60_000)
    .catch((err: Error) => { throw new Error(`${err.message}; output:\n${output.join('')}`); });
  return server;
}

const logged = (s: Server, text: string) => waitFor(`"${text}" in the server's log`, async () => (s.output.join('').includes(text) ? true : undefined));

test('SIGTERM during a request: the request completes, new connections are refused, the process exits 0', async () => {
  const server = await startServer();
  const body = JSON.stringify({ email: 'nobody@shutdown.test', password: 'not-the-password' });
  // The client sends its headers, waits for the server's 100 Continue (the request is now in progress), and only
  // sends the body after the server has begun to stop.
  const req = http.request({
    host: '127.0.0.1', port: server.port, method: 'POST', path: '/api/auth/sign-in',
    headers: { 'Content-Type': 'application/json', 'Content-Length': Buffer.byteLength(body), Expect: '100-continue', 'X-Request-Id': 'slow-request-1' },
  });
  const answered = new Promise<{ status: number; text: string }>((resolve, reject) => {
    req.on('response', (res) => {
      let text = '';
      res.on('data', (d: Buffer) => { text += d.toString(); });
      res.on('end', () => resolve({ status: res.statusCode ?? 0, text }));
    });
    req.on('error', reject);
  });
  await new Promise<void>((resolve) => req.once('continue', () => resolve()));
  server.child.kill('SIGTERM');
  await logged(server, 'stopping: no new connections');
  await expect(new Promise((resolve, reject) => {
    net.connect(server.port, '127.0.0.1').once('connect', () => resolve('connected')).once('error', (err: NodeJS.ErrnoException) => reject(err));
  })).rejects.toMatchObject({ code: 'ECONNREFUSED' });
  req.end(body);
  const res = await answered;
  expect(res.status).toBe(401);
  expect(JSON.parse(res.text).error.code).toBeTruthy();
  expect(await server.exited).toBe(0);
  const lines = server.output.join('').split('\n').filter((l) => l.startsWith('{')).map((l) => JSON.parse(l) as Record<string, unknown>);
  expect(lines).toContainEqual(expect.objectContaining({ reqId: 'slow-request-1', route: '/api/auth/sign-in', status: 401 }));
  expect(lines.at(-1)).toMatchObject({ msg: 'stopped' });
}, 120_000);

test('SIGTERM during a plan run: the run goes back to the queue and the next server finishes it', async () => {
  const { db, pool } = createDb((await demoConfig()).databaseUrl, { max: 2 });
  try {
    const planId = await insertQueuedPlan(db, WINDOW, { timeLimitSeconds: 3, seed: 3 });
    const first = await startServer();
    await jobs.jobs.sendPlanRun(planId, { expireInSeconds: 120 });
    // Stopped while its thread is searching (progress past `preparing`), not merely after it took the job.
    await waitFor('the first server to be computing', async () => {
      const row = await readPlan(db, planId);
      const phase = (row.progress as { phase?: string } | null)?.phase;
      return row.status === 'running' && phase !== undefined && phase !== 'preparing' ? row : undefined;
    }, 60_000);
    first.child.kill('SIGTERM');
    expect(await first.exited).toBe(0);
    const handedBack = await readPlan(db, planId);
    expect(handedBack.status).toBe('queued');
    expect(first.output.join('')).toMatch(new RegExp(`plan run ${planId}: .*retry \\(the worker shut down during the run\\)`));

    const second = await startServer();
    const done = await waitFor('the handed-back run to finish', async () => {
      const row = await readPlan(db, planId);
      return row.status === 'done' || row.status === 'failed' ? row : undefined;
    }, 90_000);
    expect(done.status).toBe('done');
    expect(done.attempts).toBeGreaterThanOrEqual(2);
    expect(second.output.join('')).toMatch(new RegExp(`plan run ${planId}: window ${WINDOW}, attempt [23], .*done`));
    second.child.kill('SIGTERM');
    expect(await second.exited).toBe(0);
  } finally {
    await pool.end();
  }
}, 240_000);
