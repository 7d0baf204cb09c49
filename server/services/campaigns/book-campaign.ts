// Books every window of a draft campaign in one transaction, or none: the row is locked, its version and status
// checked, and each window booked through the same path as a single booking (freezes, roles, policy). The first
// window that breaks a rule rolls everything back, and the error names its group.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { updateCampaign } from '../../queries/slots/campaign-rows';
import { AppError } from '../../errors';
import { bookWindowIn } from '../windows/create-window';
import { lockDraft } from './change-campaign';
import { CampaignEmptyError, CampaignGroupBookingError } from './errors';

export async function bookCampaign(deps: { db: Db; now: Date }, id: string, version: number, user: Me): Promise<string[]> {
  const { now } = deps;
  return deps.db.transaction(async (tx) => {
    const row = await lockDraft(tx, id, version);
    const s = row.schedule;
    const planned = s.assignment.flatMap((index, group) => (index === null ? [] : [{ group: s.groups[group], slot: s.groups[group].slots[index] }]));
    if (planned.length === 0) throw new CampaignEmptyError();
    const windowIds: string[] = [];
    for (const { group, slot } of planned) {
      try {
        windowIds.push(await bookWindowIn(tx, {
          title: `${row.title} — ${group.label}`, startsAt: slot.start, endsAt: slot.end,
          elements: group.elements.map((e) => ({ kind: e.kind, id: e.id, effect: 'down' as const })),
        }, user, now));
      } catch (err) {
        if (err instanceof AppError) throw new CampaignGroupBookingError(group.label, err);
        throw err;
      }
    }
    const newVersion = await updateCampaign(tx, id, { status: 'booked', bookedWindowIds: windowIds, now });
    await insertAuditEntry(tx, {
      actorId: user.id, action: 'campaign.book', entity: 'campaign', entityId: id, at: now,
      before: { status: 'draft', title: row.title, version: row.version },
      after: { status: 'booked', title: row.title, version: newVersion, windowIds },
    });
    return windowIds;
  });
}
