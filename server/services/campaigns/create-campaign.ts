// Starts planning a campaign: the request is stored `queued` (with its audit row) and handed to the slot-search
// worker, which stores the draft.
import { randomBytes } from 'node:crypto';
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import type { WaitingJobLimits } from '../../../shared/job-limits';
import type { CampaignCreate } from '../../../shared/slots';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { insertCampaign } from '../../queries/slots/campaign-rows';
import { checkWaitingJobs } from '../job-limits/check-waiting-jobs';
import type { SlotSearchQueue } from '../ports';
import type { SlotEngine } from './engine';
import { enqueueSlotJob } from './enqueue';
import type { CampaignRequest } from './stored-schedule';

export const newCampaignId = () => `cp-${randomBytes(9).toString('base64url')}`;

export type CampaignDeps = { db: Db; jobs: Partial<SlotSearchQueue>; engine: SlotEngine; limits: WaitingJobLimits; now: Date };

export async function createCampaign(deps: CampaignDeps, input: CampaignCreate, user: Me): Promise<string> {
  const { title, ...request } = input;
  // Every group's elements and the timing are checked as a slot search's are: a 400 now, not a failed plan.
  await deps.engine.checkSlotGroups(deps.db, request, request.groups);
  const id = newCampaignId();
  const stored: CampaignRequest = request;
  await deps.db.transaction(async (tx) => {
    // A person over the cap of campaigns being planned gets 429 and nothing is stored.
    await checkWaitingJobs(tx, deps.limits, 'campaignPlans', user.id);
    await insertCampaign(tx, { id, title, request: stored, createdBy: user.id, now: deps.now });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'campaign.create', entity: 'campaign', entityId: id, at: deps.now,
      before: null, after: { title, status: 'queued' },
    });
  });
  await enqueueSlotJob(deps, { kind: 'campaign', id });
  return id;
}
