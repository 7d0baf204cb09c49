// Instants shown in the viewer's time zone with the zone named, so nobody has to guess (windows are stored in UTC).
import { dayKeyAt } from '@/shared/zone-clock';

/**
 * This device's IANA zone, e.g. "Europe/Oslo"; UTC where the runtime does not know it. Only offered as a choice
 * when a person picks their zone: screens show times in useViewerTimeZone(), the zone the person chose.
 */
export function deviceTimeZone(): string {
  return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
}

const GMT_OFFSET_NAME = /^(GMT|UTC)[+−-]/;

function shortZoneName(instant: Date, timeZone: string, locale: string): string {
  const part = new Intl.DateTimeFormat(locale, { timeZone, timeZoneName: 'short' })
    .formatToParts(instant)
    .find((p) => p.type === 'timeZoneName');
  return part?.value ?? timeZone;
}

/**
 * Short name of `timeZone` at `instant`: "CET"/"CEST", "EST"/"EDT", else an offset such as "GMT+5:30".
 * British English knows European abbreviations and American English the North American ones, so try both.
 */
export function zoneName(instant: Date | string, timeZone: string): string {
  const at = typeof instant === 'string' ? new Date(instant) : instant;
  const british = shortZoneName(at, timeZone, 'en-GB');
  if (!GMT_OFFSET_NAME.test(british)) return british;
  const american = shortZoneName(at, timeZone, 'en-US');
  return GMT_OFFSET_NAME.test(american) ? british : american;
}

const dayFormatters = new Map<string, Intl.DateTimeFormat>();
const timeFormatters = new Map<string, Intl.DateTimeFormat>();

function cached(map: Map<string, Intl.DateTimeFormat>, timeZone: string, options: Intl.DateTimeFormatOptions) {
  let formatter = map.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-GB', { timeZone, ...options });
    map.set(timeZone, formatter);
  }
  return formatter;
}

/** "Thu 3 Dec" in `timeZone`. */
export function formatDay(instant: Date, timeZone: string): string {
  return cached(dayFormatters, timeZone, { weekday: 'short', day: 'numeric', month: 'short' }).format(instant).replace(',', '');
}

/** "23:00" in `timeZone` (24-hour clock). */
export function formatClock(instant: Date, timeZone: string): string {
  return cached(timeFormatters, timeZone, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(instant);
}

/** "Thu 3 Dec, 23:00 CET": one instant in `timeZone`, zone named. */
export function formatInstant(iso: string, timeZone: string): string {
  const at = new Date(iso);
  if (Number.isNaN(at.getTime())) return iso;
  return `${formatDay(at, timeZone)}, ${formatClock(at, timeZone)} ${zoneName(at, timeZone)}`;
}

/**
 * A window's span in `timeZone`: "Thu 3 Dec, 23:00 – Fri 4 Dec, 03:00 CET"; the end's day is left out when
 * both ends fall on one day. When a daylight-saving change falls inside, each end carries its own zone name
 * ("Sun 28 Mar, 01:00 CET – 04:00 CEST"), so the wall-clock gap is never mistaken for the duration.
 */
export function formatWindowRange(startsAtIso: string, endsAtIso: string, timeZone: string): string {
  const start = new Date(startsAtIso);
  const end = new Date(endsAtIso);
  if (Number.isNaN(start.getTime()) || Number.isNaN(end.getTime())) return `${startsAtIso} – ${endsAtIso}`;
  const sameDay = dayKeyAt(start.getTime(), timeZone) === dayKeyAt(end.getTime(), timeZone);
  const startZone = zoneName(start, timeZone);
  const endZone = zoneName(end, timeZone);
  const startText = `${formatDay(start, timeZone)}, ${formatClock(start, timeZone)}${startZone === endZone ? '' : ` ${startZone}`}`;
  const endText = sameDay ? formatClock(end, timeZone) : `${formatDay(end, timeZone)}, ${formatClock(end, timeZone)}`;
  return `${startText} – ${endText} ${endZone}`;
}

/** From this length on, durations read in days ("4 d"), which is how long freezes are thought of. */
const DAYS_FROM_HOURS = 48;

/** "4 h 30 min" (or "3 d 2 h" for long ones) for a duration measured between instants, never wall-clock readings. */
export function formatDuration(durationMs: number): string {
  const totalMinutes = Math.round(durationMs / 60_000);
  const hours = Math.floor(totalMinutes / 60);
  if (hours >= DAYS_FROM_HOURS) {
    const days = Math.floor(hours / 24);
    return hours % 24 === 0 ? `${days} d` : `${days} d ${hours % 24} h`;
  }
  const minutes = totalMinutes % 60;
  if (hours === 0) return `${minutes} min`;
  return minutes === 0 ? `${hours} h` : `${hours} h ${minutes} min`;
}
