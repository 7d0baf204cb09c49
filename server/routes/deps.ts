// What every router receives from createApp().
import type { Db } from '../../db/client';
import type { ServerConfig } from '../env';
import type { JobQueue } from '../jobs/queue';

export type RouteDeps = { db: Db; config: ServerConfig; now: () => Date; jobs: JobQueue };
