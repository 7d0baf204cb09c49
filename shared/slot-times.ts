// Candidate slots of a slot search or a campaign: every start on the step grid inside the allowed hours of each
// night in the range, in the network's zone. Pure, so the finder, the scheduler's checks and the form agree.
import type { SlotHours } from './slots';
import { addDays, dayKeyAt, startOfDayMs, weekdayOf, zoneOffsetMinutes } from './zone-clock';

const MS_PER_MINUTE = 60_000;
const MS_PER_DAY = 86_400_000;

/** The most candidate starts one search evaluates; more means a range or a grid too fine to read as a list. */
export const SLOT_MAX_CANDIDATES = 3_000;

/** One candidate: its instants (UTC ms) and its night, the local day ('YYYY-MM-DD') its allowed period begins on. */
export type SlotTime = { startMs: number; endMs: number; night: string };

export type SlotTiming = {
  from: string; to: string; hours: SlotHours; durationHours: number; weekdays?: number[]; stepMinutes: number;
};

function minutesOf(hhmm: string): number {
  const [h, m] = hhmm.split(':').map(Number);
  return h * 60 + m;
}

/** Length of the allowed period in minutes: an end at or before the start runs past midnight; equal is a whole day. */
export function allowedMinutes(hours: SlotHours): number {
  const start = minutesOf(hours.start);
  const end = minutesOf(hours.end);
  return end > start ? end - start : end + 24 * 60 - start;
}

/** ISO weekday of a local day: 1 Monday … 7 Sunday. */
export function isoWeekdayOf(night: string): number {
  const d = weekdayOf(night);
  return d === 0 ? 7 : d;
}

/** The instant clocks in `timeZone` show `minutes` past the start of `day` (corrected when the offset changes that day). */
function wallInstant(day: string, minutes: number, timeZone: string): number {
  const dayStart = startOfDayMs(day, timeZone);
  const naive = dayStart + minutes * MS_PER_MINUTE;
  return naive + (zoneOffsetMinutes(dayStart, timeZone) - zoneOffsetMinutes(naive, timeZone)) * MS_PER_MINUTE;
}

/** Every candidate slot, earliest first. Slots lie wholly inside the range and inside one night's allowed period. */
export function slotTimes(t: SlotTiming, timeZone: string): SlotTime[] {
  const durationMin = Math.round(t.durationHours * 60);
  const periodMin = allowedMinutes(t.hours);
  const fromMs = Date.parse(t.from);
  const toMs = Date.parse(t.to);
  const out: SlotTime[] = [];
  if (durationMin > periodMin || !(toMs > fromMs)) return out;
  const lastNight = dayKeyAt(toMs, timeZone);
  // A period that began the evening before `from` may still hold slots after it.
  for (let night = dayKeyAt(fromMs - MS_PER_DAY, timeZone); night <= lastNight; night = addDays(night, 1)) {
    if (t.weekdays && !t.weekdays.includes(isoWeekdayOf(night))) continue;
    const periodStart = wallInstant(night, minutesOf(t.hours.start), timeZone);
    for (let offset = 0; offset + durationMin <= periodMin; offset += t.stepMinutes) {
      const startMs = periodStart + offset * MS_PER_MINUTE;
      const endMs = startMs + durationMin * MS_PER_MINUTE;
      if (startMs >= fromMs && endMs <= toMs) out.push({ startMs, endMs, night });
    }
  }
  return out;
}

/** Why a timing gives no usable list (null when it does): the work does not fit the hours, or too many starts. */
export function slotTimingIssue(t: SlotTiming, timeZone: string): string | null {
  const periodMin = allowedMinutes(t.hours);
  if (Math.round(t.durationHours * 60) > periodMin) {
    return `${t.durationHours} hours of work do not fit in the allowed hours ${t.hours.start}–${t.hours.end} (${periodMin / 60} hours).`;
  }
  const count = slotTimes(t, timeZone).length;
  if (count === 0) return 'No start in the range falls inside the allowed hours and days; widen the range, the hours or the days.';
  if (count > SLOT_MAX_CANDIDATES) {
    return `The range, hours and step give ${count} possible starts; at most ${SLOT_MAX_CANDIDATES} are searched. Narrow the range or use a longer step.`;
  }
  return null;
}
