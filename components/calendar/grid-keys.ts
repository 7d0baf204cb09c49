// Keyboard movement in the month grid (the WAI-ARIA date grid's keys): which day gets focus after a key press.
// Reference: WAI-ARIA Authoring Practices 1.2, Date Picker Dialog example, grid keyboard support.
import { addDays, FIRST_WEEKDAY, monthOf, weekdayOf } from '@/components/time';

/** Days since the week's first day (0 … 6), with weeks starting on FIRST_WEEKDAY. */
function dayInWeek(day: string): number {
  return (weekdayOf(day) - FIRST_WEEKDAY + 7) % 7;
}

function daysInMonth(month: string): number {
  const [year, monthNumber] = month.split('-').map(Number);
  return new Date(Date.UTC(year, monthNumber, 0)).getUTCDate();
}

/** The same day of the month `by` months on, or the month's last day when it is shorter (31 Jan → 28 Feb). */
export function shiftMonthKeepingDay(day: string, by: number): string {
  const [year, monthNumber] = day.slice(0, 7).split('-').map(Number);
  const index = year * 12 + (monthNumber - 1) + by;
  const month = `${String(Math.floor(index / 12)).padStart(4, '0')}-${String((index % 12) + 1).padStart(2, '0')}`;
  const date = Math.min(Number(day.slice(8, 10)), daysInMonth(month));
  return `${month}-${String(date).padStart(2, '0')}`;
}

/**
 * The day to focus after `key` on `day`, or null when the key does not move (the caller then lets it through):
 * arrows by a day or a week, Home / End to the week's first / last day, Page Up / Page Down by a month.
 */
export function nextFocusDay(day: string, key: string): string | null {
  switch (key) {
    case 'ArrowLeft': return addDays(day, -1);
    case 'ArrowRight': return addDays(day, 1);
    case 'ArrowUp': return addDays(day, -7);
    case 'ArrowDown': return addDays(day, 7);
    case 'Home': return addDays(day, -dayInWeek(day));
    case 'End': return addDays(day, 6 - dayInWeek(day));
    case 'PageUp': return shiftMonthKeepingDay(day, -1);
    case 'PageDown': return shiftMonthKeepingDay(day, 1);
    default: return null;
  }
}

/** The grid's one Tab stop in `month`: the selected day if shown in it, else today if in it, else the 1st. */
export function tabStopDay(month: string, selectedDay: string | undefined, today: string): string {
  if (selectedDay && monthOf(selectedDay) === month) return selectedDay;
  return monthOf(today) === month ? today : `${month}-01`;
}
