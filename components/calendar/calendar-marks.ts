// Turns windows and freezes into per-day marks for the month view: one lane per window, kept on the same
// line across the days it spans (in the viewer's zone), freezes as a shaded day, today and the selection.
import { calendarColors, CALENDAR_MAX_LANES } from '@/constants/theme';
import { dayKeyAt, FIRST_WEEKDAY, splitIntoDaySegments, weekdayOf, type DaySegment } from '@/components/time';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import type { CalendarDayMark, CalendarFreeze, CalendarPeriod, CalendarWindow, MarkedDays } from './calendar-types';

/** The one status → colour map of the calendar: bars, the legend and the status filter chips all read it. */
export function statusColor(status: CalendarWindow['status']): string {
  return calendarColors.status[status] ?? calendarColors.status.draft;
}

/**
 * A one-character status cue printed on each bar and in the legend, so a status never rests on colour alone.
 * Letters where the status's initial is free; symbols for the ends of the lifecycle.
 */
export const STATUS_MARKS: Record<CalendarWindow['status'], string> = {
  draft: 'D',
  assessed: 'A',
  planned: 'P',
  'in-review': 'R',
  cleared: 'C',
  returned: '↩',
  notified: 'N',
  underway: 'U',
  done: '✓',
  'rolled-back': '↺',
  withdrawn: '✕',
};

/** The statuses of the windows drawn, in lifecycle order of first appearance, for the legend. */
export function statusesShown(marks: MarkedDays): CalendarWindow['status'][] {
  const seen = new Set<CalendarWindow['status']>();
  for (const mark of Object.values(marks)) for (const p of mark.periods) if (p.status && !p.draft) seen.add(p.status);
  return [...seen];
}

/** Whether any draft campaign's window is drawn, for the legend. */
export function draftsShown(marks: MarkedDays): boolean {
  return Object.values(marks).some((mark) => mark.periods.some((p) => p.draft));
}

type Placed = { window: CalendarWindow; lane: number; segments: DaySegment[] };

/** Earliest window first, each in the lowest lane free on every day it touches. */
export function assignLanes(windows: readonly CalendarWindow[], timeZone: string): Placed[] {
  const sorted = [...windows].sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt) || a.id.localeCompare(b.id));
  const taken = new Map<string, Set<number>>();
  return sorted.map((window) => {
    const segments = splitIntoDaySegments(window.startsAt, window.endsAt, timeZone);
    let lane = 0;
    while (segments.some((s) => taken.get(s.day)?.has(lane))) lane += 1;
    for (const s of segments) {
      if (!taken.has(s.day)) taken.set(s.day, new Set());
      taken.get(s.day)!.add(lane);
    }
    return { window, lane, segments };
  });
}

function emptyMark(): CalendarDayMark {
  return { periods: [], windowLabels: [], overflowCount: 0, windowCount: 0, hasConflict: false, freezeTitles: [] };
}

function markFor(marks: MarkedDays, day: string): CalendarDayMark {
  if (!marks[day]) marks[day] = emptyMark();
  return marks[day];
}

function placeWindow(marks: MarkedDays, { window, lane, segments }: Placed) {
  const status = window.statusLabel ?? STATUS_LABELS[window.status] ?? window.status;
  const label = window.campaign ? `${window.title} (${status}: ${window.campaign.title})` : `${window.title} (${status})`;
  for (const segment of segments) {
    const mark = markFor(marks, segment.day);
    mark.windowCount += 1;
    mark.windowLabels.push(label);
    if (window.conflictCount > 0) mark.hasConflict = true;
    if (lane >= CALENDAR_MAX_LANES) {
      mark.overflowCount += 1;
      continue;
    }
    while (mark.periods.length < lane) mark.periods.push({ color: 'transparent' });
    const period: CalendarPeriod = {
      color: statusColor(window.status),
      startingDay: segment.isFirst,
      endingDay: segment.isLast,
      windowId: window.id,
      status: window.status,
      title: window.campaign ? `${window.campaign.title}: ${window.title}` : window.title,
      draft: window.campaign ? true : undefined,
      // The title again where a long window wraps onto a new week row, so every row of bars says whose it is.
      showTitle: segment.isFirst || weekdayOf(segment.day) === FIRST_WEEKDAY,
      label,
    };
    mark.periods[lane] = period;
  }
}

/** Every calendar day a freeze covers in `timeZone` (a freeze ending at midnight does not shade the next day). */
function shadeFreeze(marks: MarkedDays, freeze: CalendarFreeze, timeZone: string) {
  for (const segment of splitIntoDaySegments(freeze.startsAt, freeze.endsAt, timeZone)) {
    markFor(marks, segment.day).freezeTitles.push(freeze.title);
  }
}

export type MarkInput = {
  windows: readonly CalendarWindow[];
  freezes: readonly CalendarFreeze[];
  timeZone: string;
  selectedDay?: string;
  /** today's day key in the viewer's zone */
  today: string;
};

/** Each day's mark for the month grid, keyed by day; days with nothing on them have none. */
export function buildMarkedDays({ windows, freezes, timeZone, selectedDay, today }: MarkInput): MarkedDays {
  const marks: MarkedDays = {};
  for (const placed of assignLanes(windows, timeZone)) placeWindow(marks, placed);
  for (const freeze of freezes) shadeFreeze(marks, freeze, timeZone);
  markFor(marks, today).today = true;
  if (selectedDay) markFor(marks, selectedDay).selected = true;
  return marks;
}

/** Today's day key in `timeZone`; `nowMs` is passed in so tests pin it. */
export function todayIn(timeZone: string, nowMs = Date.now()): string {
  return dayKeyAt(nowMs, timeZone);
}

/** The windows touching `day` in `timeZone`, earliest first. */
export function windowsOnDay<W extends CalendarWindow>(windows: readonly W[], day: string, timeZone: string): W[] {
  return windows
    .filter((w) => splitIntoDaySegments(w.startsAt, w.endsAt, timeZone).some((s) => s.day === day))
    .sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt) || a.id.localeCompare(b.id));
}

/** Freezes covering any part of `day` in `timeZone`. */
export function freezesOnDay<F extends CalendarFreeze>(freezes: readonly F[], day: string, timeZone: string): F[] {
  return freezes.filter((f) => splitIntoDaySegments(f.startsAt, f.endsAt, timeZone).some((s) => s.day === day));
}

