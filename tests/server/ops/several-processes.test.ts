// Several processes on one PostgreSQL: one API process that works no jobs (WORKER_IN_PROCESS=false) and two
// `server/worker.ts` processes share the queue. Eight plan runs asked for through the API spread over both workers;
// one worker is frozen while both are computing, known by its run's stopped heartbeat, and killed (SIGKILL); the
// other worker's sweep takes its run back and every run ends done.
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import pg from 'pg';
import request from 'supertest';
import { createDb } from '../../../db/client';
import { createApp } from '../../../server/app';
import { SESSION_COOKIE } from '../../../server/auth/session-cookie';
import { planListResponseSchema, type PlanListItem } from '../../../shared/plans';
import { testConfig } from '../helpers/test-app';
import { freshDemoDatabase, waitFor, type FreshDemoDatabase } from '../jobs/helpers/demo-db';
import { freePort } from '../helpers/free-port';

const ROOT = path.resolve(__dirname, '../../..');
/** Demo windows with a dozen touched slices each, whose runs take a second or two. */
const WINDOWS = ['w-01', 'w-10'];
const RUN_SECONDS = 2;
/** A running run's heartbeat is written every half second. */
const HEARTBEAT_TICK_MS = 500;
/** How long the victim is frozen before its run is told from the survivor's by a heartbeat that stopped. */
const FROZEN_MS = 2000;
/** A run without a heartbeat for this long is handed back by the surviving worker's sweep (the minimum allowed). */
const HEARTBEAT_STALE_SECONDS = 5;
/** Only a guard, so a stuck run fails the test with the processes' output rather than the test's own timeout. */
const GUARD_MS = 150_000;

type Proc = { name: string; child: ChildProcess; output: string[]; exited: Promise<void> };

let database: FreshDemoDatabase;
let baseEnv: NodeJS.ProcessEnv;
const started: Proc[] = [];

/** One node process (tsx as a loader, no CLI parent) in a process group of its own, so SIGKILL hits it alone. */
function startProcess(name: string, script: string, env: Record<string, string> = {}): Proc {
  const child = spawn(process.execPath, ['--import', 'tsx', script], {
    cwd: ROOT, env: { ...baseEnv, ...env }, detached: true, stdio: ['ignore', 'pipe', 'pipe'],
  });
  const output: string[] = [];
  child.stdout!.on('data', (d: Buffer) => output.push(d.toString()));
  child.stderr!.on('data', (d: Buffer) => output.push(d.toString()));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const proc = { name, child, output, exited };
  started.push(proc);
  return proc;
}

const isRunning = (p: Proc) => p.child.exitCode === null && p.child.signalCode === null;

async function killHard(p: Proc): Promise<void> {
  if (isRunning(p)) process.kill(-p.child.pid!, 'SIGKILL');
  await p.exited;
}

/** Every process's output, for a failure message. */
const outputs = () => started.map((p) => `--- ${p.name}${isRunning(p) ? '' : ' (exited)'}:\n${p.output.join('')}`).join('\n');

/** Waits for `check`, failing at once (with every process's output) when one of `alive` has exited. */
function waitWhileAlive<T>(what: string, alive: Proc[], check: () => Promise<T | undefined>): Promise<T> {
  return waitFor(what, async () => {
    const dead = alive.find((p) => !isRunning(p));
    if (dead) throw new Error(`${dead.name} exited while waiting for ${what}`);
    return check();
  }, GUARD_MS).catch((err: Error) => { throw new Error(`${err.message}\n${outputs()}`); });
}

const doneLines = (p: Proc) => [...p.output.join('').matchAll(/plan run (\S+): window \S+, attempt (\d+), [^"\n]*, done/g)]
  .map((m) => ({ planId: m[1], attempt: Number(m[2]) }));

beforeAll(async () => {
  database = await freshDemoDatabase('several_processes');
  baseEnv = {
    ...process.env, DATABASE_URL: database.url, NODE_ENV: 'test', HOST: '127.0.0.1', SMTP_SINK_PORT: '0',
    WEB_DIST: '/nonexistent-web-dist', LOG_FORMAT: 'json', LOG_LEVEL: 'info', OIDC_ISSUER_PORT: 'off',
    PLAN_HEARTBEAT_STALE_SECONDS: String(HEARTBEAT_STALE_SECONDS),
    // The one demo planner queues all eight runs at once, more than one person may have waiting by default.
    WAITING_PLAN_RUNS_PER_PERSON: '8',
  };
}, 120_000);

afterAll(async () => {
  await Promise.all(started.map((p) => killHard(p)));
  await database?.drop();
}, 60_000);

test('two workers share eight runs sent through an API that works none; a worker killed mid-run loses none of them', async () => {
  // The API first: it creates the queue's schema, which the workers then find in place.
  const port = await freePort();
  const api = startProcess('API', 'server/index.ts', { PORT: String(port), WORKER_IN_PROCESS: 'false' });
  await waitWhileAlive('the API to listen', [api], async () => (api.output.join('').includes('Slackwater listening on') ? true : undefined));
  const workers = [startProcess('worker 1', 'server/worker.ts'), startProcess('worker 2', 'server/worker.ts')];
  await waitWhileAlive('both workers to wait for jobs', [api, ...workers],
    async () => (workers.every((w) => w.output.join('').includes('waiting for jobs')) ? true : undefined));

  const base = `http://127.0.0.1:${port}`;
  const signIn = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST', headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'planner@demo.test', password: 'demo-password-1' }),
  });
  expect(signIn.status).toBe(200);
  const cookie = signIn.headers.getSetCookie().find((c) => c.startsWith(`${SESSION_COOKIE}=`))!.split(';')[0];
  const api$ = async (method: 'GET' | 'POST', route: string, body?: unknown) => {
    const res = await fetch(`${base}${route}`, {
      method, headers: { cookie, ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    if (!res.ok) throw new Error(`${method} ${route} answered ${res.status}: ${text}`);
    return JSON.parse(text) as unknown;
  };

  // The session lives in the database: another API instance, on a connection pool of its own, knows it too.
  const other = createDb(database.url, { max: 1 });
  try {
    const otherApp = createApp({ db: other.db, pool: other.pool, config: testConfig({ DATABASE_URL: database.url }) });
    const me = await request(otherApp).get('/api/me').set('Cookie', cookie);
    expect([me.status, me.body.email]).toEqual([200, 'planner@demo.test']);
  } finally {
    await other.pool.end();
  }

  for (const w of WINDOWS) await api$('POST', `/api/windows/${w}/assess`, {});
  const planIds: string[] = [];
  for (let i = 0; i < 8; i += 1) {
    const settings = { timeLimitSeconds: RUN_SECONDS, population: 8, seed: i + 1 };
    const created = await api$('POST', `/api/windows/${WINDOWS[i % 2]}/plans`, settings);
    planIds.push((created as { plan: { id: string } }).plan.id);
  }
  const runs = async (): Promise<PlanListItem[]> => {
    const lists = await Promise.all(WINDOWS.map(async (w) => planListResponseSchema.parse(await api$('GET', `/api/windows/${w}/plans`)).plans));
    return lists.flat().filter((p) => planIds.includes(p.id));
  };

  // Which run is on which worker: every worker takes one run at a time and the API process takes none, so two
  // runs running are one on each worker. The victim is frozen (SIGSTOP) first: its run's heartbeat stops while the
  // survivor's goes on, which names the victim's run, and a frozen process cannot finish it before the kill. Had the
  // victim just finished its run, nothing goes stale: it is let go on and the next pair is tried.
  const [victim, survivor] = workers;
  const client = new pg.Client({ connectionString: database.url });
  await client.connect();
  const running = async () => (await client.query<{ id: string; ageMs: number }>(
    `select id, (extract(epoch from now() - heartbeat_at) * 1000)::float8 as "ageMs" from plans where status = 'running' and id = any($1)`,
    [planIds])).rows;
  let orphanId: string | undefined;
  let freezes = 0;
  try {
    while (orphanId === undefined) {
      freezes += 1;
      await waitWhileAlive('a run on each worker, after a finished run each', [api, ...workers], async () => {
        if (!workers.every((w) => doneLines(w).length > 0)) return undefined;
        return (await running()).length === 2 ? true : undefined;
      });
      process.kill(-victim.child.pid!, 'SIGSTOP');
      await new Promise((r) => setTimeout(r, FROZEN_MS));
      const rows = await running();
      const stale = rows.filter((r) => r.ageMs >= FROZEN_MS - HEARTBEAT_TICK_MS);
      if (rows.length === 2 && stale.length === 1) {
        orphanId = stale[0].id;
      } else {
        // Let it write a heartbeat again before the next try, so that freezes never add up to a stale run.
        process.kill(-victim.child.pid!, 'SIGCONT');
        await new Promise((r) => setTimeout(r, 2 * HEARTBEAT_TICK_MS));
      }
    }
  } finally {
    await client.end();
  }
  await killHard(victim);
  if (process.env.JOBS_TEST_TIMINGS) console.log(`victim's run told apart after ${freezes} freeze(s)`);

  const finished = await waitWhileAlive('every run to end', [api, survivor], async () => {
    const all = await runs();
    return all.length === 8 && all.every((p) => p.status !== 'queued' && p.status !== 'running') ? all : undefined;
  });
  const byId = (a: { id: string }, b: { id: string }) => a.id.localeCompare(b.id);
  expect(finished.map((p) => ({ id: p.id, status: p.status, error: p.error })).sort(byId))
    .toEqual(planIds.map((id) => ({ id, status: 'done', error: null })).sort(byId));

  // Both workers took runs: each logged at least one of its own as done, and none twice.
  const byVictim = doneLines(victim);
  const bySurvivor = doneLines(survivor);
  expect(byVictim.length).toBeGreaterThan(0);
  expect(bySurvivor.length).toBeGreaterThan(0);
  expect([...byVictim, ...bySurvivor].map((d) => d.planId).sort()).toEqual([...planIds].sort());

  // The killed worker's run: its heartbeat stopped, the survivor's sweep handed it back to the queue, and the
  // survivor finished it in a later attempt.
  const orphan = finished.find((p) => p.id === orphanId)!;
  expect(orphan.attempts).toBeGreaterThanOrEqual(2);
  expect(survivor.output.join('')).toContain(`plan ${orphanId}: worker stopped sending heartbeats; back to the queue`);
  expect(bySurvivor.find((d) => d.planId === orphanId)?.attempt).toBe(orphan.attempts);
  // The API process worked no job: it only sent them.
  expect(api.output.join('')).not.toMatch(/plan run \S+: window/);
}, 300_000);
