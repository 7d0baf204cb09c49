// Reading campaigns: one by id, and the list the calendar overlays (drafts by default), limited to those with a
// window in the asked range when one is given.
import type { Db } from '../../../db/client';
import type { Campaign, CampaignStatus } from '../../../shared/slots';
import { selectCampaign, selectCampaigns } from '../../queries/slots/campaign-rows';
import { campaignView } from './campaign-view';
import { CampaignNotFoundError } from './errors';

/** The most campaigns one list answers (newest first). */
export const CAMPAIGN_LIST_LIMIT = 200;

export async function getCampaign(db: Db, id: string): Promise<Campaign> {
  const row = await selectCampaign(db, id);
  if (!row) throw new CampaignNotFoundError(id);
  return campaignView(row);
}

export async function listCampaigns(
  db: Db, filter: { statuses: CampaignStatus[] | null; fromMs: number | null; toMs: number | null },
): Promise<Campaign[]> {
  const rows = await selectCampaigns(db, filter.statuses, CAMPAIGN_LIST_LIMIT);
  const all = rows.map(campaignView);
  if (filter.fromMs === null && filter.toMs === null) return all;
  const from = filter.fromMs ?? -Infinity;
  const to = filter.toMs ?? Infinity;
  return all.filter((c) => c.windows.some((w) => Date.parse(w.start) < to && Date.parse(w.end) > from));
}
