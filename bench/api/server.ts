// The API server as a child process of the bench (as `npm start` runs it, with the plan worker in the process),
// and its resident memory read from /proc/<pid>/status (VmRSS) every 250 ms.
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '..', '..');
const TSX = path.join(ROOT, 'node_modules', '.bin', 'tsx');
const READY_TIMEOUT_MS = 120_000;
const STOP_TIMEOUT_MS = 20_000;
const RSS_EVERY_MS = 250;
const SCRIPT = 'server/index.ts';

export type BenchServer = { baseUrl: string; pid: number; logPath: string; stop: () => Promise<void> };

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Parent pid of every process, from /proc/<pid>/stat (the field after the command name in parentheses). */
function parentPids(): Map<number, number> {
  const parents = new Map<number, number>();
  for (const entry of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = fs.readFileSync(`/proc/${entry}/stat`, 'utf8');
      parents.set(Number(entry), Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]));
    } catch {
      // the process ended while the list was read
    }
  }
  return parents;
}

function commandLine(pid: number): string {
  try {
    return fs.readFileSync(`/proc/${pid}/cmdline`, 'utf8').replaceAll('\0', ' ');
  } catch {
    return '';
  }
}

/**
 * The process that runs the server: tsx starts it as a node process of its own below the one it was started as,
 * and that one has children of its own (esbuild's service), so the walk follows only processes running `script`.
 */
function serverProcess(root: number, script: string): number {
  const parents = parentPids();
  let current = root;
  for (;;) {
    const child = [...parents.entries()].find(([pid, parent]) => parent === current && commandLine(pid).includes(script))?.[0];
    if (child === undefined) return current;
    current = child;
  }
}

function exited(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    child.once('exit', () => resolve());
  });
}

async function untilReady(baseUrl: string, child: ChildProcess, logPath: string): Promise<void> {
  const deadline = Date.now() + READY_TIMEOUT_MS;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the server exited (code ${child.exitCode}); see ${logPath}`);
    const res = await fetch(`${baseUrl}/api/ready`).catch(() => null);
    if (res?.status === 200) return;
    await sleep(250);
  }
  throw new Error(`the server was not ready after ${READY_TIMEOUT_MS / 1000} s; see ${logPath}`);
}

/** Starts server/index.ts on 127.0.0.1:port against databaseUrl and waits until /api/ready answers 200. */
export async function startServer(databaseUrl: string, port: number): Promise<BenchServer> {
  const logPath = path.join(ROOT, '.data', 'bench-api-server.log');
  fs.mkdirSync(path.dirname(logPath), { recursive: true });
  const log = fs.openSync(logPath, 'w');
  // Its own process group, so stop() reaches tsx and the node process below it with one signal.
  const child = spawn(TSX, [SCRIPT], {
    cwd: ROOT, detached: true, stdio: ['ignore', log, log],
    env: {
      ...process.env, DATABASE_URL: databaseUrl, PORT: String(port), HOST: '127.0.0.1',
      WORKER_IN_PROCESS: 'true', SMTP_SINK_PORT: '0', SHUTDOWN_GRACE_SECONDS: '5',
    },
  });
  const baseUrl = `http://127.0.0.1:${port}`;
  const stop = async () => {
    if (child.exitCode !== null || child.signalCode !== null || child.pid === undefined) return;
    process.kill(-child.pid, 'SIGTERM');
    const stopped = await Promise.race([exited(child).then(() => true), sleep(STOP_TIMEOUT_MS).then(() => false)]);
    if (!stopped) process.kill(-child.pid, 'SIGKILL');
    await exited(child);
  };
  try {
    await untilReady(baseUrl, child, logPath);
  } catch (err) {
    await stop();
    throw err;
  }
  return { baseUrl, pid: serverProcess(child.pid!, SCRIPT), logPath, stop };
}

/** VmRSS of one process in bytes, or null once it is gone. */
function readRss(pid: number): number | null {
  try {
    const line = fs.readFileSync(`/proc/${pid}/status`, 'utf8').split('\n').find((l) => l.startsWith('VmRSS:'));
    return line ? Number(line.replace(/\D+/g, '')) * 1024 : null;
  } catch {
    return null;
  }
}

export type RssSampler = { phase: (name: string) => void; maxBytes: (name: string) => number | null; stop: () => void };

/** Samples VmRSS every 250 ms and keeps the highest value per named phase (the phase set last). */
export function sampleRss(pid: number): RssSampler {
  const max = new Map<string, number>();
  let phase = 'starting';
  const sample = () => {
    const rss = readRss(pid);
    if (rss !== null) max.set(phase, Math.max(max.get(phase) ?? 0, rss));
  };
  const timer = setInterval(sample, RSS_EVERY_MS);
  return {
    phase: (name) => { sample(); phase = name; sample(); },
    maxBytes: (name) => max.get(name) ?? null,
    stop: () => { sample(); clearInterval(timer); },
  };
}
