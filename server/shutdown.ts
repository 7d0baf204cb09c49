// Graceful stop on SIGTERM/SIGINT: no new connections, requests in progress finish (up to the grace period), a
// running plan job stops its thread and goes back to the queue (the next start or another worker runs it again),
// then the pools close and the process exits 0. Past the grace period the connections left are cut; if closing
// itself hangs (a database that does not answer), the process exits 1 a few seconds later.
import type http from 'node:http';
import type { Logger } from './log/logger';

/** After the grace period: how long closing the pools may take before the process gives up and exits 1. */
const CLOSE_MARGIN_MS = 5_000;

export type ShutdownParts = {
  server: http.Server;
  /** job workers and the queue: a running plan is handed back (server/background.ts) */
  stopBackground: () => Promise<void>;
  /** other resources to close alongside (thread pools) */
  closeOthers?: (() => Promise<void>)[];
  /** the database pools, closed last: requests in progress still use them */
  closePools: () => Promise<void>;
  logger: Logger;
  graceMs: number;
  exit?: (code: number) => void;
};

/** Counts requests whose response has not finished; install before the server takes requests. */
export function countInFlight(server: http.Server): () => number {
  let inFlight = 0;
  server.on('request', (_req: http.IncomingMessage, res: http.ServerResponse) => {
    inFlight += 1;
    res.once('close', () => { inFlight -= 1; });
  });
  return () => inFlight;
}

function withinMs<T>(work: Promise<T>, ms: number): Promise<T | 'timeout'> {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<'timeout'>((resolve) => { timer = setTimeout(() => resolve('timeout'), ms); });
  return Promise.race([work, late]).finally(() => clearTimeout(timer));
}

/** Stops accepting at once; resolves when every connection has closed, cutting those still open after graceMs. */
async function drainServer(parts: ShutdownParts, inFlight: () => number): Promise<void> {
  const { server, logger, graceMs } = parts;
  const closed = new Promise<void>((resolve) => server.close(() => resolve()));
  // Idle keep-alive connections would otherwise hold close() open until the client drops them.
  server.closeIdleConnections();
  if (inFlight() > 0) logger.info({ inFlight: inFlight() }, 'waiting for requests in progress');
  if ((await withinMs(closed, graceMs)) === 'timeout') {
    logger.warn({ cut: inFlight(), graceSeconds: graceMs / 1000 }, 'grace period over: closing the connections left');
    server.closeAllConnections();
    await closed;
  }
}

/** Returns the signal handler; a second signal while stopping is ignored (the first one's deadline holds). */
export function gracefulShutdown(parts: ShutdownParts, inFlight: () => number): (signal: string) => void {
  const exit = parts.exit ?? ((code: number) => process.exit(code));
  const { logger, graceMs } = parts;
  let stopping = false;
  return (signal) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal, graceSeconds: graceMs / 1000 }, 'stopping: no new connections');
    setTimeout(() => {
      logger.error({ afterSeconds: (graceMs + CLOSE_MARGIN_MS) / 1000 }, 'could not stop in time; exiting');
      exit(1);
    }, graceMs + CLOSE_MARGIN_MS).unref();
    const failed = (what: string) => (err: unknown) =>
      logger.warn({ reason: err instanceof Error ? err.message : String(err) }, `${what} did not stop cleanly`);
    const background = withinMs(parts.stopBackground(), graceMs).then((outcome) => {
      if (outcome === 'timeout') logger.warn('the job queue did not stop within the grace period');
    }, failed('the job queue'));
    const others = (parts.closeOthers ?? []).map((close) => close().catch(failed('a worker pool')));
    void Promise.all([drainServer(parts, inFlight), background, ...others])
      .then(() => parts.closePools().catch(failed('the database pool')))
      .then(() => {
        logger.info('stopped');
        exit(0);
      });
  };
}
