// The "when" half of the slot finder's and the campaign scheduler's forms: duration, date range, allowed hours and
// weekdays as typed, their checks, and the request fields they become. Dates and hours are read in the network's
// zone, the zone the server enumerates slots in (shared/slot-times.ts). Pure, so tests need no screen.
import { SLOT_MAX_RANGE_DAYS, type SlotHours } from '@/shared/slots';
import { allowedMinutes, slotTimingIssue } from '@/shared/slot-times';
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { addDays, dayKeyAt, startOfDayMs } from '@/shared/zone-clock';
import { parseLooseDate, parseLooseTime } from '@/components/windows/zoned-time';

export type TimingValues = {
  /** hours of work as typed ("4", "2.5") */
  durationText: string;
  /** first and last night, 'YYYY-MM-DD' in the network's zone (both included) */
  fromDate: string;
  toDate: string;
  /** allowed hours, 'HH:MM' in the network's zone; an end at or before the start runs past midnight */
  hoursStart: string;
  hoursEnd: string;
  /** ISO weekdays (1 Monday … 7 Sunday) an allowed period may begin on */
  weekdays: number[];
};

export type TimingField = 'duration' | 'from' | 'to' | 'hours' | 'weekdays';
export type TimingErrors = Partial<Record<TimingField, string>>;

export type TimingOutput = {
  durationHours: number; from: string; to: string; hours: SlotHours; weekdays?: number[]; stepMinutes: 60;
};

export const ALL_WEEKDAYS = [1, 2, 3, 4, 5, 6, 7] as const;
export const WEEKDAY_LABELS: Record<number, string> = { 1: 'Mon', 2: 'Tue', 3: 'Wed', 4: 'Thu', 5: 'Fri', 6: 'Sat', 7: 'Sun' };
export const WEEKDAY_NAMES: Record<number, string> = {
  1: 'Monday', 2: 'Tuesday', 3: 'Wednesday', 4: 'Thursday', 5: 'Friday', 6: 'Saturday', 7: 'Sunday',
};

/** Three weeks of nights from tomorrow, 00:00–05:00: the question engineers ask most ("some night in the next three weeks"). */
export const DEFAULT_RANGE_NIGHTS = 21;
export function defaultTiming(nowMs: number): TimingValues {
  const today = dayKeyAt(nowMs, NETWORK_TIME_ZONE);
  return {
    durationText: '4', fromDate: addDays(today, 1), toDate: addDays(today, DEFAULT_RANGE_NIGHTS),
    hoursStart: '00:00', hoursEnd: '05:00', weekdays: [...ALL_WEEKDAYS],
  };
}

/** Parses "4", "2.5" or "2,5 h" into hours; null when not a positive number. */
export function parseHours(text: string): number | null {
  const match = /^\s*(\d+(?:[.,]\d+)?)\s*(h|hours?)?\s*$/i.exec(text);
  if (!match) return null;
  const hours = Number(match[1].replace(',', '.'));
  return hours > 0 ? hours : null;
}

const MS_PER_MINUTE = 60_000;
const minutesOf = (hhmm: string) => Number(hhmm.slice(0, 2)) * 60 + Number(hhmm.slice(3, 5));

/**
 * The range as instants: from the first night's allowed start to the last night's allowed end, so exactly the
 * nights picked are searched (a period past midnight ends on the next day). The network's zone keeps no daylight
 * saving, so minutes past its midnight are wall-clock minutes.
 */
export function rangeOf(fromDay: string, toDay: string, hours: SlotHours): { from: string; to: string } {
  const fromMs = startOfDayMs(fromDay, NETWORK_TIME_ZONE) + minutesOf(hours.start) * MS_PER_MINUTE;
  const toMs = startOfDayMs(toDay, NETWORK_TIME_ZONE) + (minutesOf(hours.start) + allowedMinutes(hours)) * MS_PER_MINUTE;
  return { from: new Date(fromMs).toISOString(), to: new Date(toMs).toISOString() };
}

function checkDates(values: TimingValues, errors: TimingErrors): { fromDay?: string; toDay?: string } {
  const fromDay = parseLooseDate(values.fromDate);
  const toDay = parseLooseDate(values.toDate);
  if (!fromDay) errors.from = 'Enter the first night as a date such as 2027-01-08.';
  if (!toDay) errors.to = 'Enter the last night as a date such as 2027-01-29.';
  if (!fromDay || !toDay) return {};
  if (toDay < fromDay) {
    errors.to = 'The last night must be on or after the first.';
    return {};
  }
  if (dayCount(fromDay, toDay) > SLOT_MAX_RANGE_DAYS) {
    errors.to = `The range may cover at most ${SLOT_MAX_RANGE_DAYS} days; pick a nearer last night.`;
    return {};
  }
  return { fromDay, toDay };
}

function dayCount(fromDay: string, toDay: string): number {
  return (Date.parse(`${toDay}T00:00:00Z`) - Date.parse(`${fromDay}T00:00:00Z`)) / 86_400_000 + 1;
}

/** Checks the timing fields; `output` is set only when they are all usable. */
export function validateTiming(values: TimingValues): { errors: TimingErrors; output: TimingOutput | null } {
  const errors: TimingErrors = {};
  const durationHours = parseHours(values.durationText);
  if (durationHours === null) errors.duration = 'Enter how many hours the work takes, such as 4 or 2.5.';
  else if (durationHours > 24) errors.duration = 'A slot here is at most 24 hours; book longer work as a window by itself.';
  const { fromDay, toDay } = checkDates(values, errors);
  const start = parseLooseTime(values.hoursStart);
  const end = parseLooseTime(values.hoursEnd);
  if (!start || !end) errors.hours = 'Enter the allowed hours as 24-hour times such as 00:00 and 05:00.';
  if (values.weekdays.length === 0) errors.weekdays = 'Pick at least one day of the week.';
  if (Object.keys(errors).length > 0 || durationHours === null || !fromDay || !toDay || !start || !end) return { errors, output: null };
  const hours = { start, end };
  const weekdays = values.weekdays.length === ALL_WEEKDAYS.length ? undefined : [...values.weekdays].sort();
  const output: TimingOutput = { durationHours, ...rangeOf(fromDay, toDay, hours), hours, stepMinutes: 60, ...(weekdays ? { weekdays } : {}) };
  // The server's own words for a timing that gives no list (work longer than the hours, no start, too many).
  const issue = slotTimingIssue(output, NETWORK_TIME_ZONE);
  if (issue) {
    if (/do not fit/.test(issue)) errors.duration = issue;
    else errors.hours = issue;
    return { errors, output: null };
  }
  return { errors, output };
}
