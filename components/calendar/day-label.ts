// What a screen reader says for a day of the month grid, the same shape for every day:
// "Fri 8 January 2027, today, 2 windows: Rectifier swap (Planned), Fibre splice (Draft), with a conflict, freeze: …".
import { weekdayOf } from '@/components/time';
import type { CalendarDayMark } from './calendar-types';

const WEEKDAYS_SHORT = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'] as const;
const MONTHS = [
  'January', 'February', 'March', 'April', 'May', 'June',
  'July', 'August', 'September', 'October', 'November', 'December',
] as const;

/** "Fri 8 January 2027" for day key '2027-01-08'; a day key has no zone, so none is applied. */
export function dayName(day: string): string {
  const [year, month, date] = day.split('-').map(Number);
  return `${WEEKDAYS_SHORT[weekdayOf(day)]} ${date} ${MONTHS[month - 1]} ${year}`;
}

/** The day's accessible name; `mark` is absent on days with nothing on them. */
export function dayLabel(day: string, mark?: CalendarDayMark): string {
  const parts = [dayName(day)];
  if (mark?.today) parts.push('today');
  const count = mark?.windowCount ?? 0;
  const windows = count === 1 ? '1 window' : `${count === 0 ? 'no' : count} windows`;
  const titles = mark?.windowLabels ?? [];
  parts.push(titles.length > 0 ? `${windows}: ${titles.join(', ')}` : windows);
  if (mark?.hasConflict) parts.push('with a conflict');
  if (mark && mark.freezeTitles.length > 0) parts.push(`freeze: ${mark.freezeTitles.join(', ')}`);
  return parts.join(', ');
}
