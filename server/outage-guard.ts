// A last line of defence for the server and worker processes: a promise that a library left unawaited and that
// failed only because the database was unreachable must not end the process (Node's default for an unhandled
// rejection). Every other unhandled rejection still ends it, as before.
import { isDatabaseUnavailable } from './db-unavailable';

let installed = false;

export function surviveDatabaseOutages(log: (line: string) => void = (line) => console.error(line)): void {
  if (installed) return;
  installed = true;
  process.on('unhandledRejection', (reason) => {
    if (isDatabaseUnavailable(reason)) {
      log(`database unavailable: ${reason instanceof Error ? reason.message : String(reason)} (the work is retried)`);
      return;
    }
    // Rethrown from here it becomes an uncaught exception, which ends the process as Node would have.
    throw reason;
  });
}
