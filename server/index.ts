// Entry point: parse the environment, connect, start the job queue (and its in-process workers), listen;
// close cleanly on SIGINT/SIGTERM.
import { createDb } from '../db/client';
import { createApp } from './app';
import { startBackground } from './background';
import { parseEnvOrExit } from './env';
import { uploadChecks } from './imports/check-thread';

async function main(): Promise<void> {
  const config = parseEnvOrExit();
  const { db, pool } = createDb(config.databaseUrl);
  const background = await startBackground({ db, config });
  const app = createApp({ db, pool, config, jobs: background.jobs });
  const server = app.listen(config.port, config.host, () => {
    const workers = config.workerInProcess ? 'with an in-process worker' : 'without workers (WORKER_IN_PROCESS=false)';
    console.log(`Slackwater listening on http://${config.host}:${config.port} (${workers})`);
  });
  server.on('error', (err) => {
    console.error(`Cannot listen on ${config.host}:${config.port}: ${err.message}`);
    process.exit(1);
  });

  let closing = false;
  function shutdown(signal: string) {
    if (closing) return;
    closing = true;
    console.log(`${signal}: closing`);
    // A plan run in progress goes back to the queue (another worker or the next start picks it up).
    const stopped = new Promise<void>((resolve) => server.close(() => resolve()));
    Promise.all([stopped, background.stop(), uploadChecks.close()])
      .catch((err: unknown) => console.error(`shutdown: ${err instanceof Error ? err.message : String(err)}`))
      .finally(() => pool.end().finally(() => process.exit(0)));
    // Keep-alive connections may hold close() open; do not hang the caller's Ctrl-C.
    setTimeout(() => process.exit(0), 15_000).unref();
    server.closeIdleConnections();
  }
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(`Slackwater could not start: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
