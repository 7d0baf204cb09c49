// Calendar bars carry the window's title and a status letter, and their colour and letter per status are the ones
// the legend shows.
import { render, screen } from '@testing-library/react-native';
import { StyleSheet } from 'react-native';
import { buildMarkedDays, STATUS_MARKS, statusColor, statusesShown } from '@/components/calendar/calendar-marks';
import { CalendarLegend } from '@/components/calendar/calendar-legend';
import { MonthCalendar } from '@/components/calendar/month-calendar';
import type { CalendarWindow } from '@/components/calendar/calendar-types';
import { WINDOW_STATUSES } from '@/shared/windows';

function win(id: string, startsAt: string, endsAt: string, status: CalendarWindow['status']): CalendarWindow {
  return {
    id, title: `Fibre splice ${id}`, startsAt, endsAt, status, conflictCount: 0, touchesCritical: false,
    workType: 'fibre splice', elements: [{ kind: 'span', id: `span-${id}`, effect: 'down', fraction: null }],
  };
}

// Three windows in three statuses; 'long' runs Fri 4 Dec to Tue 8 Dec (UTC), across a week row.
const windows = [
  win('a', '2026-12-02T01:00:00Z', '2026-12-02T05:00:00Z', 'draft'),
  win('b', '2026-12-02T10:00:00Z', '2026-12-02T12:00:00Z', 'cleared'),
  win('long', '2026-12-04T22:00:00Z', '2026-12-08T04:00:00Z', 'underway'),
];
const marks = buildMarkedDays({ windows, freezes: [], timeZone: 'UTC', today: '2026-12-01' });

const colourOf = (testID: string) => StyleSheet.flatten(screen.getByTestId(testID, { includeHiddenElements: true }).props.style).backgroundColor;

test('legend and bars agree on the colour of every status', () => {
  render(<CalendarLegend statuses={WINDOW_STATUSES} />);
  for (const status of WINDOW_STATUSES) expect(colourOf(`calendar-legend-swatch-${status}`)).toBe(statusColor(status));
  const bars = Object.values(marks).flatMap((m) => m.periods).filter((p) => p.status);
  expect(bars.length).toBeGreaterThan(3);
  for (const bar of bars) expect(bar.color).toBe(statusColor(bar.status!));
  // Distinct statuses get distinct colours, or the legend could not tell them apart.
  expect(new Set(WINDOW_STATUSES.map(statusColor)).size).toBe(WINDOW_STATUSES.length);
});

test('in the month view, each bar is drawn in its legend swatch colour and the legend lists the statuses on screen', () => {
  render(<MonthCalendar month="2026-12" today="2026-12-01" marks={marks} onDayPress={() => {}} onMonthChange={() => {}} />);
  expect(statusesShown(marks).sort()).toEqual(['cleared', 'draft', 'underway']);
  for (const w of windows) {
    const day = w.startsAt.slice(0, 10);
    expect(colourOf(`calendar.day_${day}-bar-${w.id}`)).toBe(colourOf(`calendar-legend-swatch-${w.status}`));
  }
  expect(screen.queryByTestId('calendar-legend-planned')).toBeNull();
});

test('a bar shows its status letter on every day, and the title where the window starts and again on a new week row', () => {
  render(<MonthCalendar month="2026-12" today="2026-12-01" marks={marks} onDayPress={() => {}} onMonthChange={() => {}} />);
  const first = screen.getByTestId('calendar.day_2026-12-04-bar-long', { includeHiddenElements: true });
  expect(first).toHaveTextContent(`${STATUS_MARKS.underway} Fibre splice long`);
  // The bar is drawing inside a named day cell: no label of its own for a screen reader to trip over.
  expect(first.props['aria-label']).toBeUndefined();
  expect(first.props.accessibilityLabel).toBeUndefined();
  // Saturday continues the bar without repeating the title; Monday starts a new row and names it again.
  const saturday = screen.getByTestId('calendar.day_2026-12-05-bar-long', { includeHiddenElements: true });
  expect(saturday).not.toHaveTextContent('Fibre splice long');
  expect(saturday).toHaveTextContent(STATUS_MARKS.underway);
  expect(screen.getByTestId('calendar.day_2026-12-07-bar-long', { includeHiddenElements: true }))
    .toHaveTextContent(`${STATUS_MARKS.underway} Fibre splice long`);
  // The day's own name lists its windows with their statuses in words.
  expect(screen.getByTestId('calendar.day_2026-12-02', { includeHiddenElements: true }))
    .toHaveAccessibleName('Wed 2 December 2026, 2 windows: Fibre splice a (Draft), Fibre splice b (Cleared)');
});

test('every status has its own letter, and the legend prints it on the swatch the bars share', () => {
  expect(new Set(WINDOW_STATUSES.map((s) => STATUS_MARKS[s])).size).toBe(WINDOW_STATUSES.length);
  render(<CalendarLegend statuses={['draft', 'done']} />);
  expect(screen.getByTestId('calendar-legend-swatch-draft', { includeHiddenElements: true })).toHaveTextContent(STATUS_MARKS.draft);
  expect(screen.getByTestId('calendar-legend-done')).toHaveTextContent(/Done/);
});
