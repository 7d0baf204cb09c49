// The range of days a month view shows (whole weeks, Monday first) and the instants to ask the API for.
import { addDays, endOfDayMs, startOfDayMs, weekdayOf } from '@/shared/zone-clock';

/** Monday first, as in most of the places our operators work; react-native-calendars' `firstDay={1}`. */
export const FIRST_WEEKDAY = 1;

/** 'YYYY-MM' of a day key. */
export function monthOf(dayKey: string): string {
  return dayKey.slice(0, 7);
}

/** First and last calendar day of the weeks that show month `month` ('YYYY-MM'), both inclusive. */
export function visibleDays(month: string): { firstDay: string; lastDay: string } {
  const firstOfMonth = `${month}-01`;
  const lead = (weekdayOf(firstOfMonth) - FIRST_WEEKDAY + 7) % 7;
  const firstOfNext = addDays(firstOfMonth, 32).slice(0, 7) + '-01';
  const lastOfMonth = addDays(firstOfNext, -1);
  const trail = (FIRST_WEEKDAY + 6 - weekdayOf(lastOfMonth) + 7) % 7;
  return { firstDay: addDays(firstOfMonth, -lead), lastDay: addDays(lastOfMonth, trail) };
}

/** The UTC instants bounding what month `month` shows in `timeZone`: `from` inclusive, `to` exclusive. */
export function visibleRange(month: string, timeZone: string): { from: string; to: string } {
  const { firstDay, lastDay } = visibleDays(month);
  return {
    from: new Date(startOfDayMs(firstDay, timeZone)).toISOString(),
    to: new Date(endOfDayMs(lastDay, timeZone)).toISOString(),
  };
}
