// Entry point: parse the environment, connect, start the job queue (and its in-process workers), listen;
// stop gracefully on SIGINT/SIGTERM (server/shutdown.ts).
import { createDb } from '../db/client';
import { createApp } from './app';
import { startBackground } from './background';
import { parseEnvOrExit, type ServerConfig } from './env';
import { uploadChecks } from './imports/check-thread';
import { createLogger, lineLog, type Logger } from './log/logger';
import { inventoryCacheFor } from './services/inventory/inventory-cache';
import { countInFlight, gracefulShutdown } from './shutdown';

async function main(): Promise<void> {
  const config = parseEnvOrExit();
  const logger = createLogger(config.log);
  try {
    await serve(config, logger);
  } catch (err) {
    logger.fatal({ reason: err instanceof Error ? err.message : String(err) }, 'Slackwater could not start');
    process.exit(1);
  }
}

async function serve(config: ServerConfig, logger: Logger): Promise<void> {
  const { db, pool } = createDb(config.databaseUrl);
  // Builds the inventory now and again after every write any process makes (LISTEN/NOTIFY), off the request path.
  const inventory = inventoryCacheFor(db);
  void inventory.listen(config.databaseUrl, (what, err) => logger.warn({ reason: err.message }, what));
  const background = await startBackground({ db, config, log: lineLog(logger.child({ component: 'jobs' })) });
  const app = createApp({ db, pool, config, jobs: background.jobs, logger });
  const server = app.listen(config.port, config.host, () => {
    const workers = config.workerInProcess ? 'with an in-process worker' : 'without workers (WORKER_IN_PROCESS=false)';
    logger.info(`Slackwater listening on http://${config.host}:${config.port} (${workers})`);
  });
  server.on('error', (err) => {
    logger.fatal(`Cannot listen on ${config.host}:${config.port}: ${err.message}`);
    process.exit(1);
  });
  const inFlight = countInFlight(server);
  const shutdown = gracefulShutdown({
    server, logger, graceMs: config.shutdownGraceSeconds * 1000,
    stopBackground: () => background.stop(),
    closeOthers: [() => uploadChecks.close(), () => inventory.close()],
    closePools: () => pool.end(),
  }, inFlight);
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

void main();
