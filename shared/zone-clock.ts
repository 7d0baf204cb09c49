// Wall-clock arithmetic in an IANA time zone, built on Intl only (no zone database of our own).
// Instants are UTC milliseconds; calendar days are 'YYYY-MM-DD' keys, as react-native-calendars uses them.

const MS_PER_MINUTE = 60_000;
const MS_PER_DAY = 86_400_000;

export type WallClock = { year: number; month: number; day: number; hour: number; minute: number; second: number };

const partsFormatters = new Map<string, Intl.DateTimeFormat>();

function partsFormatter(timeZone: string): Intl.DateTimeFormat {
  let formatter = partsFormatters.get(timeZone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: 'numeric',
      day: 'numeric',
      hour: 'numeric',
      minute: 'numeric',
      second: 'numeric',
    });
    partsFormatters.set(timeZone, formatter);
  }
  return formatter;
}

/** The wall clock in `timeZone` at instant `instantMs`. */
export function wallClockAt(instantMs: number, timeZone: string): WallClock {
  const values: Record<string, number> = {};
  for (const part of partsFormatter(timeZone).formatToParts(new Date(instantMs))) {
    if (part.type !== 'literal') values[part.type] = Number(part.value);
  }
  // Some engines write midnight as hour 24 even with h23.
  const hour = values.hour === 24 ? 0 : values.hour;
  return { year: values.year, month: values.month, day: values.day, hour, minute: values.minute, second: values.second };
}

/** Offset of `timeZone` from UTC at `instantMs`, in minutes (Berlin in winter: +60). */
export function zoneOffsetMinutes(instantMs: number, timeZone: string): number {
  const clock = wallClockAt(instantMs, timeZone);
  const asUtcMs = Date.UTC(clock.year, clock.month - 1, clock.day, clock.hour, clock.minute, clock.second);
  const wholeSecondMs = instantMs - (((instantMs % 1000) + 1000) % 1000);
  return Math.round((asUtcMs - wholeSecondMs) / MS_PER_MINUTE);
}

function pad(value: number, width = 2): string {
  return String(value).padStart(width, '0');
}

/** The calendar day ('YYYY-MM-DD') that `instantMs` falls on in `timeZone`. */
export function dayKeyAt(instantMs: number, timeZone: string): string {
  const clock = wallClockAt(instantMs, timeZone);
  return `${pad(clock.year, 4)}-${pad(clock.month)}-${pad(clock.day)}`;
}

function parseDayKey(dayKey: string): { year: number; month: number; day: number } {
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(dayKey);
  if (!match) throw new Error(`Not a calendar day: ${dayKey}`);
  return { year: Number(match[1]), month: Number(match[2]), day: Number(match[3]) };
}

/** `dayKey` moved by `days` calendar days (zone-free: a day key is a date, not an instant). */
export function addDays(dayKey: string, days: number): string {
  const { year, month, day } = parseDayKey(dayKey);
  const moved = new Date(Date.UTC(year, month - 1, day) + days * MS_PER_DAY);
  return `${pad(moved.getUTCFullYear(), 4)}-${pad(moved.getUTCMonth() + 1)}-${pad(moved.getUTCDate())}`;
}

/** Day of the week of `dayKey`, 0 = Sunday … 6 = Saturday. */
export function weekdayOf(dayKey: string): number {
  const { year, month, day } = parseDayKey(dayKey);
  return new Date(Date.UTC(year, month - 1, day)).getUTCDay();
}

/**
 * The first instant of calendar day `dayKey` in `timeZone`. Usually local midnight; where a zone skips
 * midnight for a daylight-saving change, the first wall-clock time that exists that day.
 */
export function startOfDayMs(dayKey: string, timeZone: string): number {
  const { year, month, day } = parseDayKey(dayKey);
  const midnightAsUtcMs = Date.UTC(year, month - 1, day);
  // Two passes settle the offset: the first guess may sit on the other side of a change.
  let guessMs = midnightAsUtcMs - zoneOffsetMinutes(midnightAsUtcMs, timeZone) * MS_PER_MINUTE;
  guessMs = midnightAsUtcMs - zoneOffsetMinutes(guessMs, timeZone) * MS_PER_MINUTE;
  // A skipped midnight lands on the previous day; step forward to the day's first existing minute.
  while (dayKeyAt(guessMs, timeZone) < dayKey) guessMs += 15 * MS_PER_MINUTE;
  // An offset that overshoots lands on a later minute than needed; walk back while still the same day.
  while (dayKeyAt(guessMs - 15 * MS_PER_MINUTE, timeZone) === dayKey) guessMs -= 15 * MS_PER_MINUTE;
  return guessMs;
}

/** The instant the next calendar day starts, i.e. the exclusive end of `dayKey` in `timeZone`. */
export function endOfDayMs(dayKey: string, timeZone: string): number {
  return startOfDayMs(addDays(dayKey, 1), timeZone);
}
