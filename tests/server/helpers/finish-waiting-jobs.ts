// For suites that leave jobs queued on purpose (a recording queue works none): ends the given people's unfinished
// slot searches, campaign plans and move-plan runs as failed, so the next test starts under the per-person cap on
// waiting jobs (shared/job-limits.ts).
import type pg from 'pg';

const TABLES = [
  { table: 'slot_searches', finishedAt: 'finished_at' },
  { table: 'campaigns', finishedAt: 'updated_at' },
  { table: 'plans', finishedAt: 'finished_at' },
] as const;

export async function finishWaitingJobs(pool: pg.Pool, userIds: string[]): Promise<void> {
  for (const { table, finishedAt } of TABLES) {
    await pool.query(
      `update ${table} set status = 'failed', error = 'Ended by the test set-up.', ${finishedAt} = now()
       where created_by = any($1) and status in ('queued', 'running')`,
      [userIds],
    );
  }
}
