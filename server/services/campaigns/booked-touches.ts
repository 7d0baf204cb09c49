// The windows booked around a campaign's slots, as its once-in-D-days rule reads them: active windows within D
// days of any slot (withdrawn, done and rolled-back ones are not active), with the slices each touches.
import type { Queryable } from '../../../db/client';
import { assessImpact } from '../../../planner/impact/assess-impact';
import type { Inventory } from '../../../planner/model/types';
import type { SlotHours } from '../../../shared/slots';
import { NETWORK_TIME_ZONE } from '../../../shared/time-zone';
import { selectImpactSlices } from '../../queries/slots/impact-slices';
import { loadContextWindows, type ContextWindow } from '../slots/slot-context';
import { nightsCovered, type BookedTouch } from './booked-spacing';

const MS_PER_DAY = 86_400_000;

/**
 * Booked windows that may lie less than `minDays` nights from a slot in [fromMs, toMs] (none without slots). The
 * range is widened by one more day each side, since a slot's night can be the day before its start; the rule itself
 * then counts by night. A window's slices are its stored impact's (assessed and later), else what the work on its
 * elements touches, computed as the slot finder computes a group's (the impact without other windows).
 */
export async function loadBookedTouches(
  db: Queryable, inventory: Inventory, range: { fromMs: number; toMs: number } | null, hours: SlotHours, minDays: number,
): Promise<BookedTouch[]> {
  if (minDays <= 0 || range === null) return [];
  const marginMs = (minDays + 1) * MS_PER_DAY;
  const windows = await loadContextWindows(db, inventory, range.fromMs - marginMs, range.toMs + marginMs);
  const stored = await selectImpactSlices(db, windows.map((w) => w.id));
  // A stored impact holds until the window's times or elements change, which deletes it (every status change
  // bumps the version, so the version would not tell).
  const touchedBy = (w: ContextWindow): string[] =>
    stored.get(w.id) ?? assessImpact(inventory, w.spec).affected.map((a) => a.slice);
  return windows.map((w) => ({
    title: w.title,
    ...nightsCovered(w.startMs, w.endMs, hours, NETWORK_TIME_ZONE),
    slices: new Set(touchedBy(w)),
  }));
}
