// How a screen names the zone its times are in, once: "Europe/Oslo (CET)", "UTC", "GMT-1, the network's zone".
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { formatWindowRange, zoneName } from './zoned-format';

/** The zone's name for people: the IANA name with its abbreviation, never the same word twice ("UTC (UTC)"). */
export function describeZone(timeZone: string, at: Date = new Date()): string {
  const abbreviation = zoneName(at, timeZone);
  // "Etc/GMT+1" reads backwards (it is UTC−1), so the Etc zones go by their abbreviation alone.
  const name = timeZone.startsWith('Etc/') ? abbreviation : timeZone;
  const both = abbreviation === name || timeZone === 'UTC' ? name : `${name} (${abbreviation})`;
  return timeZone === NETWORK_TIME_ZONE ? `${both}, the network's zone` : both;
}

/** "Times in Europe/Oslo (CET)": the line a screen shows once, above its times. */
export function timesInLabel(timeZone: string, at?: Date): string {
  return `Times in ${describeZone(timeZone, at)}`;
}

/** Whether a screen in `timeZone` also shows UTC under its times (not when it is UTC already). */
export function isUtcZone(timeZone: string): boolean {
  return timeZone === 'UTC' || timeZone === 'Etc/UTC' || timeZone === 'Etc/GMT' || timeZone === 'GMT';
}

/** The same span in UTC, for the second line under a local time: "Thu 3 Dec, 22:00 – Fri 4 Dec, 02:00 UTC". */
export function formatUtcRange(startsAtIso: string, endsAtIso: string): string {
  return formatWindowRange(startsAtIso, endsAtIso, 'UTC');
}
