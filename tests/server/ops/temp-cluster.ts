// A PostgreSQL cluster of the test's own (initdb into a temporary folder, a free loopback port), for tests that
// stop and start the database. Never the project's shared cluster: other suites and helpers use that one.
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from '../helpers/free-port';

/** Newest installed major version, as scripts/pg.sh finds it. */
function bindir(): string {
  const root = '/usr/lib/postgresql';
  const versions = fs.existsSync(root) ? fs.readdirSync(root).filter((v) => fs.existsSync(path.join(root, v, 'bin', 'pg_ctl'))) : [];
  const newest = versions.sort((a, b) => Number(a) - Number(b)).at(-1);
  if (!newest) throw new Error('PostgreSQL server binaries not found under /usr/lib/postgresql (see scripts/pg.sh)');
  return path.join(root, newest, 'bin');
}

const isRoot = () => process.getuid?.() === 0;

/** initdb and postgres refuse to run as root: as root they run as the `postgres` system user. */
function asPg(command: string, args: string[]): string {
  const [file, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', command, ...args]] : [command, args];
  return execFileSync(file, argv, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
}

export type TempCluster = {
  port: number;
  url: (database: string) => string;
  /** fast shutdown (SIGINT to the postmaster): sessions are ended with 57P01, new connections refused */
  stopFast(): void;
  start(): void;
  /** stops it and removes its folder */
  destroy(): void;
};

export async function startTempCluster(): Promise<TempCluster> {
  const bin = bindir();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'slackwater-pg-'));
  const data = path.join(dir, 'data');
  fs.mkdirSync(data);
  if (isRoot()) execFileSync('chown', ['-R', 'postgres:postgres', dir]);
  fs.chmodSync(dir, 0o755);
  asPg(path.join(bin, 'initdb'), ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  const port = await freePort();
  const ctl = (...args: string[]) => asPg(path.join(bin, 'pg_ctl'), ['-D', data, ...args]);
  const start = () => {
    ctl('-l', path.join(dir, 'server.log'), '-o', `-c listen_addresses=127.0.0.1 -p ${port} -k ${dir}`, '-w', '-t', '60', 'start');
  };
  start();
  return {
    port,
    url: (database) => `postgres://postgres@127.0.0.1:${port}/${database}`,
    stopFast: () => { ctl('-m', 'fast', '-w', 'stop'); },
    start,
    destroy: () => {
      try { ctl('-m', 'immediate', '-w', 'stop'); } catch { /* already stopped */ }
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
