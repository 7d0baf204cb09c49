// Splits a window into the calendar days it touches in the viewer's zone, so a window from 23:00 to 03:00
// is drawn on both days and a day with a daylight-saving change keeps its true length.
import { addDays, dayKeyAt, endOfDayMs, startOfDayMs } from '@/shared/zone-clock';

export type DaySegment = {
  /** Calendar day in the zone, 'YYYY-MM-DD'. */
  day: string;
  startMs: number;
  /** Exclusive end. */
  endMs: number;
  /** Measured between instants, so a 02:00–03:00 skipped hour is not counted. */
  durationMs: number;
  /** The window starts on this day (not carried over from the day before). */
  isFirst: boolean;
  /** The window ends on this day. */
  isLast: boolean;
};

/** A window that ends where it starts (or before) has no days; cap guards against a corrupt end date. */
const MAX_SEGMENT_DAYS = 400;

/** The per-day pieces of [startsAt, endsAt) in `timeZone`, in day order. An end exactly at midnight adds no empty day. */
export function splitIntoDaySegments(startsAtIso: string, endsAtIso: string, timeZone: string): DaySegment[] {
  const windowStartMs = Date.parse(startsAtIso);
  const windowEndMs = Date.parse(endsAtIso);
  if (!(windowEndMs > windowStartMs)) return [];
  const segments: DaySegment[] = [];
  let day = dayKeyAt(windowStartMs, timeZone);
  let startMs = windowStartMs;
  while (startMs < windowEndMs && segments.length < MAX_SEGMENT_DAYS) {
    const dayEndMs = endOfDayMs(day, timeZone);
    const endMs = Math.min(dayEndMs, windowEndMs);
    segments.push({ day, startMs, endMs, durationMs: endMs - startMs, isFirst: segments.length === 0, isLast: endMs === windowEndMs });
    day = addDays(day, 1);
    startMs = dayEndMs;
  }
  return segments;
}

/** Whether [startsAt, endsAt) overlaps calendar day `day` in `timeZone`. */
export function overlapsDay(startsAtIso: string, endsAtIso: string, day: string, timeZone: string): boolean {
  const dayStartMs = startOfDayMs(day, timeZone);
  const dayEndMs = endOfDayMs(day, timeZone);
  return Date.parse(startsAtIso) < dayEndMs && Date.parse(endsAtIso) > dayStartMs;
}

/** Length of calendar day `day` in `timeZone` in hours: 24, or 23/25 on daylight-saving change days. */
export function dayLengthHours(day: string, timeZone: string): number {
  return (endOfDayMs(day, timeZone) - startOfDayMs(day, timeZone)) / 3_600_000;
}
