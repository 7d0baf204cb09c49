// A second Slackwater started the way a new operator starts it: `SEED_DEMO=false` with an admin from
// ADMIN_EMAIL / ADMIN_PASSWORD, on its own empty database (E2E_FRESH_DATABASE_URL, made empty by
// scripts/test.sh) and its own free port. It serves the same exported web app as the main e2e server.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { eventually } from './eventually';

const ROOT = path.resolve(__dirname, '../../..');
const TSX = path.join(ROOT, 'node_modules/.bin/tsx');

export type FreshInstance = { baseUrl: string; adminEmail: string; adminPassword: string; stop: () => Promise<void> };

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = net.createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
    s.on('error', reject);
  });
}

/** Runs db/setup.ts without the demo, then the API server; resolves once /api/ready says the server is ready (database, queue, migrations). */
export async function startFreshInstance(): Promise<FreshInstance> {
  const databaseUrl = process.env.E2E_FRESH_DATABASE_URL;
  if (!databaseUrl) throw new Error('E2E_FRESH_DATABASE_URL is not set (scripts/test.sh creates that empty database)');
  const adminEmail = 'first.admin@operator.test';
  const adminPassword = 'a-long-first-day-passphrase';
  const env = { ...process.env, DATABASE_URL: databaseUrl, SEED_DEMO: 'false', ADMIN_EMAIL: adminEmail, ADMIN_PASSWORD: adminPassword };
  const setup = spawnSync(TSX, ['db/setup.ts'], { cwd: ROOT, env, encoding: 'utf8' });
  if (setup.status !== 0) throw new Error(`db/setup.ts without the demo failed:\n${setup.stderr}`);

  const port = await freePort();
  const logPath = path.join(ROOT, '.data', 'e2e-fresh-server.log');
  fs.mkdirSync(path.dirname(logPath), { recursive: true });
  const log = fs.openSync(logPath, 'w');
  const server: ChildProcess = spawn(TSX, ['server/index.ts'], {
    cwd: ROOT,
    env: { ...env, PORT: String(port), HOST: '127.0.0.1', WORKER_IN_PROCESS: 'true', SMTP_SINK_PORT: '0' },
    stdio: ['ignore', log, log],
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  await eventually(async () => {
    if (server.exitCode !== null) throw new Error(`the fresh server exited (${server.exitCode}); see ${logPath}`);
    const res = await fetch(`${baseUrl}/api/ready`);
    expect(res.status).toBe(200);
  }, 60_000);
  return {
    baseUrl, adminEmail, adminPassword,
    stop: () => new Promise<void>((resolve) => {
      if (server.exitCode !== null) return resolve();
      server.once('exit', () => resolve());
      server.kill('SIGTERM');
    }),
  };
}
