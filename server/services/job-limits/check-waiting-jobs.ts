// The per-person cap on unfinished background jobs (shared/job-limits.ts, changed by the server's environment),
// checked inside the transaction that inserts the new job's row.
import type { Tx } from '../../../db/client';
import type { WaitingJobKind, WaitingJobLimits } from '../../../shared/job-limits';
import { countUnfinishedJobs } from '../../queries/limits/waiting-jobs';
import { lockKeyForTransaction } from '../../queries/locks/advisory-locks';
import { TooManyWaitingError } from './errors';

/** Namespace of the per-person advisory lock (the second key is the hash of "kind:user id"). */
const WAITING_JOBS_LOCK = 7_615_402;

/**
 * Throws TooManyWaitingError when `userId` already has the cap of unfinished `kind` jobs, so nothing is written.
 * WARNING: call it in the transaction that then inserts the row. The advisory lock is held until that transaction
 * ends, so two simultaneous requests by one person are counted one after the other and never both slip under.
 */
export async function checkWaitingJobs(tx: Tx, limits: WaitingJobLimits, kind: WaitingJobKind, userId: string): Promise<void> {
  await lockKeyForTransaction(tx, WAITING_JOBS_LOCK, `${kind}:${userId}`);
  const limit = limits[kind];
  if (await countUnfinishedJobs(tx, kind, userId) >= limit) throw new TooManyWaitingError(kind, limit);
}
