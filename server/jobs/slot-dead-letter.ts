// Slot-search jobs whose retries are used up land on the dead-letter queue: their search or campaign is marked
// failed with a reason a person reads, so none stays `queued` or `running` for ever.
import type { Db } from '../../db/client';
import { failUnfinishedCampaign } from '../queries/slots/campaign-rows';
import { failUnfinishedSearch } from '../queries/slots/search-rows';
import type { SlotSearchJob } from '../services/ports';
import { deadRunReason } from './plan-dead-letter';

export async function markDeadSlotJob(
  db: Db, job: { data: Partial<SlotSearchJob>; output?: unknown; retryCount?: number }, log: (l: string) => void,
): Promise<void> {
  const { kind, id } = job.data ?? {};
  if (!id || (kind !== 'slots' && kind !== 'campaign')) return;
  const reason = deadRunReason(job.output, (job.retryCount ?? 0) + 1);
  const now = new Date();
  const ended = kind === 'slots' ? await failUnfinishedSearch(db, id, reason, now) : await failUnfinishedCampaign(db, id, reason, now);
  if (ended) log(`${kind === 'slots' ? 'slot search' : 'campaign'} ${id}: failed for good (${reason})`);
}
