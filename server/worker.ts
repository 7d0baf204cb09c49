// `npm run worker`: a stand-alone job worker (plan runs, mail) on the queue in DATABASE_URL's PostgreSQL.
// Start as many as you like, on any machine that reaches the database; they share the queue.
import { createDb } from '../db/client';
import { startWorkers } from './background';
import { parseEnvOrExit } from './env';
import { createLogger, lineLog } from './log/logger';
import { inventoryCacheFor } from './services/inventory/inventory-cache';

async function main(): Promise<void> {
  const config = parseEnvOrExit();
  const logger = createLogger({ ...config.log, base: { component: 'worker' } });
  const { db, pool } = createDb(config.databaseUrl, { max: 4 });
  const background = await startWorkers({ db, config, log: lineLog(logger) }).catch((err: unknown) => {
    logger.fatal({ reason: err instanceof Error ? err.message : String(err) }, 'worker could not start');
    process.exit(1);
  });
  // Plan runs read the compiled inventory; kept current by notifications so a run's input is ready at once.
  const inventory = inventoryCacheFor(db);
  void inventory.listen(config.databaseUrl, (what, err) => logger.warn({ reason: err.message }, what));
  logger.info(`Slackwater worker ${process.pid} waiting for jobs (queue schema ${config.jobSchema})`);
  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    logger.info({ signal }, 'worker stopping (a run in progress goes back to the queue)');
    Promise.all([background.stop(), inventory.close()])
      .catch((err: unknown) => logger.warn({ reason: err instanceof Error ? err.message : String(err) }, 'worker stop failed'))
      .finally(() => pool.end().finally(() => process.exit(0)));
    setTimeout(() => process.exit(1), (config.shutdownGraceSeconds + 5) * 1000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

void main();
