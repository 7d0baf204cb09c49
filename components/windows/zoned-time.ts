// Form fields (a date and a clock time in the viewer's zone) ↔ an exact instant, so people type local time
// and the API gets ISO 8601 with an offset. Builds on the calendar's zone clock (components/time).
import { wallClockAt, zoneOffsetMinutes, type WallClock } from '@/components/time/zone-clock';

const DATE_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;
const TIME_PATTERN = /^(\d{1,2}):(\d{2})$/;
const MS_PER_MINUTE = 60_000;
const HALF_DAY_MS = 12 * 60 * MS_PER_MINUTE;

type Wall = Omit<WallClock, 'second'>;

function wallAsUtcMs(wall: Wall): number {
  return Date.UTC(wall.year, wall.month - 1, wall.day, wall.hour, wall.minute);
}

function parseWall(date: string, time: string): Wall | null {
  const d = DATE_PATTERN.exec(date.trim());
  const t = TIME_PATTERN.exec(time.trim());
  if (!d || !t) return null;
  const wall = { year: +d[1], month: +d[2], day: +d[3], hour: +t[1], minute: +t[2] };
  if (wall.hour > 23 || wall.minute > 59) return null;
  const check = new Date(wallAsUtcMs(wall));
  // Date.UTC rolls 31 Feb into March; a round trip catches dates that do not exist.
  if (check.getUTCMonth() + 1 !== wall.month || check.getUTCDate() !== wall.day) return null;
  return wall;
}

export type ZonedParse = { ok: true; instantMs: number } | { ok: false; reason: 'format' | 'skipped' };

/**
 * The instant at which clocks in `timeZone` show `date` (YYYY-MM-DD) and `time` (HH:MM).
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

const pad = (n: number) => String(Math.abs(n)).padStart(2, '0');

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
