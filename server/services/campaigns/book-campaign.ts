// Books every window of a draft campaign in one transaction, or none: the row is locked, its version and status
// checked, the once-in-D-days rule checked again against windows booked since the draft was planned, and each window
// booked through the same path as a single booking (freezes, roles, policy). The first window that breaks a rule
// rolls everything back, and the error names its group.
import type { Db } from '../../../db/client';
import type { Me } from '../../../shared/api';
import { insertAuditEntry } from '../../queries/audit/audit-log';
import { updateCampaign } from '../../queries/slots/campaign-rows';
import { AppError } from '../../errors';
import { dayNumber } from '../../../planner/campaign/compile-campaign';
import type { Tx } from '../../../db/client';
import { currentInventory } from '../inventory/inventory-cache';
import { namesOf } from '../slots/slot-words';
import { bookWindowIn } from '../windows/create-window';
import { blocksAt, bookedSharing, bookedSinceReason } from './booked-spacing';
import { loadBookedTouches } from './booked-touches';
import { lockDraft } from './change-campaign';
import { CampaignEmptyError, CampaignGroupBookingError, CampaignSpacingError } from './errors';
import type { CampaignRequest, StoredSchedule, StoredSlot } from './stored-schedule';

type Planned = { group: StoredSchedule['groups'][number]; slot: StoredSlot };

/**
 * Refuses the booking when a window booked since planning lies too near a planned night on a shared slice. The
 * windows are read in the booking's transaction; the network comes from the server's cached inventory (`db`), since
 * a transaction would compile it afresh.
 */
async function checkSpacingAgain(db: Db, tx: Tx, planned: readonly Planned[], request: CampaignRequest): Promise<void> {
  const minDays = request.minDaysBetweenTouches;
  if (minDays <= 0) return;
  const { scenario, inventory } = await currentInventory(db);
  const range = { fromMs: Math.min(...planned.map((p) => p.slot.startMs)), toMs: Math.max(...planned.map((p) => p.slot.endMs)) };
  const booked = await loadBookedTouches(tx, inventory, range, request.hours, minDays);
  for (const { group, slot } of planned) {
    const blocks = blocksAt(bookedSharing(booked, group.touched), dayNumber(slot.night), minDays);
    if (blocks.length > 0) throw new CampaignGroupBookingError(group.label, new CampaignSpacingError(bookedSinceReason(blocks, minDays, namesOf(scenario))));
  }
}

export async function bookCampaign(deps: { db: Db; now: Date }, id: string, version: number, user: Me): Promise<string[]> {
  const { now } = deps;
  return deps.db.transaction(async (tx) => {
    const row = await lockDraft(tx, id, version);
    const s = row.schedule;
    const planned = s.assignment.flatMap((index, group) => (index === null ? [] : [{ group: s.groups[group], slot: s.groups[group].slots[index] }]));
    if (planned.length === 0) throw new CampaignEmptyError();
    await checkSpacingAgain(deps.db, tx, planned, row.request as CampaignRequest);
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
