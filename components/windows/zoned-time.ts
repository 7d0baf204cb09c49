// Form fields (a date and a clock time in the viewer's zone) ↔ an exact instant, so people type local time
// and the API gets ISO 8601 with an offset. Builds on the calendar's zone clock (components/time).
import { wallClockAt, zoneOffsetMinutes, type WallClock } from '@/shared/zone-clock';

const MS_PER_MINUTE = 60_000;
const HALF_DAY_MS = 12 * 60 * MS_PER_MINUTE;

type Wall = Omit<WallClock, 'second'>;

function wallAsUtcMs(wall: Wall): number {
  return Date.UTC(wall.year, wall.month - 1, wall.day, wall.hour, wall.minute);
}

const MONTHS = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];
const pad = (n: number) => String(Math.abs(n)).padStart(2, '0');

function dateKey(year: number, month: number, day: number): string | null {
  const check = new Date(Date.UTC(year, month - 1, day));
  // Date.UTC rolls 31 Feb into March; a round trip catches dates that do not exist.
  if (month < 1 || month > 12 || check.getUTCMonth() + 1 !== month || check.getUTCDate() !== day) return null;
  return `${year}-${pad(month)}-${pad(day)}`;
}

/**
 * A typed date as 'YYYY-MM-DD', or null. Lenient about the form people type on a phone or paste:
 * "2027-01-08", "2027/1/8", "20270108", "8 Jan 2027", "8 January 2027", "Jan 8 2027".
 */
export function parseLooseDate(text: string): string | null {
  const t = text.trim().toLowerCase().replace(/,/g, ' ');
  let m = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})$/.exec(t) ?? /^(\d{4})(\d{2})(\d{2})$/.exec(t);
  if (m) return dateKey(+m[1], +m[2], +m[3]);
  m = /^(\d{1,2})\.?\s*([a-z]{3})[a-z]*\.?\s+(\d{4})$/.exec(t);
  if (m && MONTHS.includes(m[2])) return dateKey(+m[3], MONTHS.indexOf(m[2]) + 1, +m[1]);
  m = /^([a-z]{3})[a-z]*\.?\s*(\d{1,2})\s+(\d{4})$/.exec(t);
  if (m && MONTHS.includes(m[1])) return dateKey(+m[3], MONTHS.indexOf(m[1]) + 1, +m[2]);
  return null;
}

/** A typed clock time as 'HH:MM' (24-hour), or null: "01:00", "1:00", "0100", "1.00", "1", "13h30". */
export function parseLooseTime(text: string): string | null {
  const t = text.trim().toLowerCase();
  const m = /^(\d{1,2})(?:[:.h]?(\d{2}))?h?$/.exec(t) ?? /^(\d{2})(\d{2})$/.exec(t);
  if (!m) return null;
  const hour = +m[1];
  const minute = m[2] === undefined ? 0 : +m[2];
  if (hour > 23 || minute > 59) return null;
  return `${pad(hour)}:${pad(minute)}`;
}

/**
 * Splits a date and time typed into one field ("20270108 0100", "2027-01-08 01:00", "8 Jan 2027 1:00",
 * "2027-01-08T01:00") into the canonical pair; null when the text is not both.
 */
export function splitLooseDateTime(text: string): { date: string; time: string } | null {
  const t = text.trim().replace(/(\d)T(\d)/, '$1 $2');
  const cut = t.lastIndexOf(' ');
  if (cut < 0) return null;
  const date = parseLooseDate(t.slice(0, cut));
  const time = parseLooseTime(t.slice(cut + 1));
  return date && time ? { date, time } : null;
}

function parseWall(date: string, time: string): Wall | null {
  const d = parseLooseDate(date);
  const t = parseLooseTime(time);
  if (!d || !t) return null;
  const [year, month, day] = d.split('-').map(Number);
  const [hour, minute] = t.split(':').map(Number);
  return { year, month, day, hour, minute };
}

export type ZonedParse = { ok: true; instantMs: number } | { ok: false; reason: 'format' | 'skipped' };

/**
 * The instant at which clocks in `timeZone` show `date` and `time` (read leniently, see parseLooseDate/Time).
 * A wall time the zone skips (clocks jump forward) is refused rather than silently moved.
 */
export function zonedWallToInstant(date: string, time: string, timeZone: string): ZonedParse {
  const wall = parseWall(date, time);
  if (!wall) return { ok: false, reason: 'format' };
  const naiveMs = wallAsUtcMs(wall);
  // Offsets half a day either side bracket any change; a repeated hour keeps its earlier reading.
  const candidates = [-HALF_DAY_MS, HALF_DAY_MS]
    .map((shiftMs) => naiveMs - zoneOffsetMinutes(naiveMs + shiftMs, timeZone) * MS_PER_MINUTE)
    .filter((candidateMs) => wallAsUtcMs(wallClockAt(candidateMs, timeZone)) === naiveMs);
  if (candidates.length === 0) return { ok: false, reason: 'skipped' };
  return { ok: true, instantMs: Math.min(...candidates) };
}

/** ISO 8601 with the zone's offset at that instant, e.g. "2026-12-03T22:00:00-01:00". */
export function toIsoWithOffset(instantMs: number, timeZone: string): string {
  const wall = wallClockAt(instantMs, timeZone);
  const offset = zoneOffsetMinutes(instantMs, timeZone);
  const sign = offset < 0 ? '-' : '+';
  const date = `${wall.year}-${pad(wall.month)}-${pad(wall.day)}`;
  return `${date}T${pad(wall.hour)}:${pad(wall.minute)}:00${sign}${pad(Math.trunc(offset / 60))}:${pad(offset % 60)}`;
}

/** The date and time fields the form shows for an instant, in `timeZone`. */
export function instantToWallFields(iso: string, timeZone: string): { date: string; time: string } {
  const wall = wallClockAt(new Date(iso).getTime(), timeZone);
  return { date: `${wall.year}-${pad(wall.month)}-${pad(wall.day)}`, time: `${pad(wall.hour)}:${pad(wall.minute)}` };
}
