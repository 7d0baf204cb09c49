// Hands a stored search or campaign to the slot-search queue. One the queue never took must not wait as `queued`
// for ever: it is marked failed with the reason, and the caller answers 503.
import type { Queryable } from '../../../db/client';
import { failUnfinishedCampaign } from '../../queries/slots/campaign-rows';
import { failUnfinishedSearch } from '../../queries/slots/search-rows';
import type { SlotSearchJob, SlotSearchQueue } from '../ports';
import { SearchQueueUnavailableError } from './errors';

export async function enqueueSlotJob(
  deps: { db: Queryable; jobs: Partial<SlotSearchQueue>; now: Date }, job: SlotSearchJob,
): Promise<void> {
  const what = job.kind === 'slots' ? 'slot search' : 'campaign';
  try {
    if (!deps.jobs.sendSlotSearch) throw new Error('this server has no slot-search queue');
    await deps.jobs.sendSlotSearch(job);
  } catch (err) {
    const error = `The job queue did not take the ${what}: ${err instanceof Error ? err.message : String(err)}`;
    if (job.kind === 'slots') await failUnfinishedSearch(deps.db, job.id, error, deps.now);
    else await failUnfinishedCampaign(deps.db, job.id, error, deps.now);
    throw new SearchQueueUnavailableError(what);
  }
}
