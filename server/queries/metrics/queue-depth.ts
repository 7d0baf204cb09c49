// Job-queue depth for the metrics scrape, read from pg-boss's own job table (as its getQueueSize does), so the
// API process needs no pg-boss handle and the figure covers every process sharing the queue.
import { sql } from 'drizzle-orm';
import type { Db } from '../../../db/client';

export type QueueDepthRow = { queue: string; state: 'waiting' | 'active'; jobs: number };

/** Waiting (created, or waiting to retry) and active jobs per queue; queues with none are absent. */
export async function selectQueueDepth(db: Db, jobSchema: string): Promise<QueueDepthRow[]> {
  const result = await db.execute<{ queue: string; state: 'waiting' | 'active'; jobs: number }>(sql`
    select name as queue, case when state = 'active' then 'active' else 'waiting' end as state, count(*)::int as jobs
    from ${sql.identifier(jobSchema)}.job
    where state in ('created', 'retry', 'active')
    group by 1, 2`);
  return result.rows.map((r) => ({ queue: r.queue, state: r.state, jobs: Number(r.jobs) }));
}
