// Entry point: parse the environment, connect, listen; close cleanly on SIGINT/SIGTERM.
import { createDb } from '../db/client';
import { createApp } from './app';
import { ConfigError, parseEnv } from './env';

function loadConfig() {
  try {
    return parseEnv();
  } catch (err) {
    if (err instanceof ConfigError) {
      console.error(err.message);
      process.exit(1);
    }
    throw err;
  }
}

const config = loadConfig();
const { db, pool } = createDb(config.databaseUrl);
const app = createApp({ db, pool, config });
const server = app.listen(config.port, config.host, () => {
  console.log(`Slackwater listening on http://${config.host}:${config.port}`);
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
  server.close(() => {
    pool.end().finally(() => process.exit(0));
  });
  // Keep-alive connections may hold close() open; do not hang the caller's Ctrl-C.
  setTimeout(() => process.exit(0), 5000).unref();
  server.closeIdleConnections();
}
process.on('SIGINT', () => shutdown('SIGINT'));
process.on('SIGTERM', () => shutdown('SIGTERM'));
