// `npm run worker`: a stand-alone job worker (plan runs, mail) on the queue in DATABASE_URL's PostgreSQL.
// Start as many as you like, on any machine that reaches the database; they share the queue.
import { createDb } from '../db/client';
import { startWorkers } from './background';
import { parseEnvOrExit } from './env';

async function main(): Promise<void> {
  const config = parseEnvOrExit();
  const { db, pool } = createDb(config.databaseUrl, { max: 4 });
  const background = await startWorkers({ db, config });
  console.log(`Slackwater worker ${process.pid} waiting for jobs (queue schema ${config.jobSchema})`);
  let closing = false;
  const shutdown = (signal: string) => {
    if (closing) return;
    closing = true;
    console.log(`${signal}: worker stopping (a run in progress goes back to the queue)`);
    background.stop()
      .catch((err: unknown) => console.error(`worker stop: ${err instanceof Error ? err.message : String(err)}`))
      .finally(() => pool.end().finally(() => process.exit(0)));
    setTimeout(() => process.exit(0), 15_000).unref();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((err: unknown) => {
  console.error(`worker could not start: ${err instanceof Error ? err.message : String(err)}`);
  process.exit(1);
});
