// Background services the server process runs besides HTTP: the job queue (pg-boss), its workers when
// WORKER_IN_PROCESS is on, and the local SMTP sink when SMTP_URL=sink. `npm run worker` uses startWorkers alone.
// OWNERS (this session): plan queue/worker = helper A1; SMTP sink + mail worker = helper B1.
import type { Db } from '../db/client';
import type { ServerConfig } from './env';
import type { JobQueue } from './jobs/queue';

export interface Background {
  jobs: JobQueue;
  /** stops workers, the queue and the sink; safe to call twice */
  stop(): Promise<void>;
}

export async function startBackground(_deps: { db: Db; config: ServerConfig }): Promise<Background> {
  throw new Error('not wired yet: helper A1 starts pg-boss here, helper B1 the SMTP sink and mail worker');
}
