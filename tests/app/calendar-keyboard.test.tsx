// The month grid by keyboard: which day the keys move to (pure), one Tab stop that follows the arrows, Space
// selecting, months changing at the grid's edges and by Page Up / Page Down, and the grid's roles and day names.
import fc from 'fast-check';
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { useState } from 'react';
import { buildMarkedDays } from '@/components/calendar/calendar-marks';
import type { CalendarWindow } from '@/components/calendar/calendar-types';
import { dayLabel, dayName } from '@/components/calendar/day-label';
import { nextFocusDay, shiftMonthKeepingDay, tabStopDay } from '@/components/calendar/grid-keys';
import { MonthCalendar } from '@/components/calendar/month-calendar';
import { addDays, monthOf, weekdayOf } from '@/components/time';

describe('nextFocusDay', () => {
  test('arrows move by a day or a week, across month and year ends', () => {
    expect(nextFocusDay('2027-01-08', 'ArrowRight')).toBe('2027-01-09');
    expect(nextFocusDay('2027-01-01', 'ArrowLeft')).toBe('2026-12-31');
    expect(nextFocusDay('2027-01-08', 'ArrowUp')).toBe('2027-01-01');
    expect(nextFocusDay('2026-12-28', 'ArrowDown')).toBe('2027-01-04');
  });

  test('Home and End go to the Monday and the Sunday of the week', () => {
    // Fri 8 January 2027
    expect(nextFocusDay('2027-01-08', 'Home')).toBe('2027-01-04');
    expect(nextFocusDay('2027-01-08', 'End')).toBe('2027-01-10');
    expect(nextFocusDay('2027-01-04', 'Home')).toBe('2027-01-04');
  });

  test('Page Up / Page Down keep the day of the month, or take the shorter month\'s last day', () => {
    expect(nextFocusDay('2027-01-31', 'PageDown')).toBe('2027-02-28');
    expect(nextFocusDay('2024-03-31', 'PageUp')).toBe('2024-02-29');
    expect(nextFocusDay('2026-12-15', 'PageDown')).toBe('2027-01-15');
    expect(shiftMonthKeepingDay('2027-01-10', -1)).toBe('2026-12-10');
  });

  test('other keys do not move', () => {
    for (const key of ['a', 'Enter', ' ', 'Tab']) expect(nextFocusDay('2027-01-08', key)).toBeNull();
  });

  test('for any day, Home is a Monday at most six days back and End the Sunday six days after Home', () => {
    const days = fc.integer({ min: 0, max: 20_000 }).map((n) => addDays('2000-01-01', n));
    fc.assert(fc.property(days, (day) => {
      const home = nextFocusDay(day, 'Home')!;
      const end = nextFocusDay(day, 'End')!;
      return weekdayOf(home) === 1 && home <= day && day <= end && addDays(home, 6) === end;
    }));
  });

  test('the Tab stop is the selected day in its month, else today in its month, else the 1st', () => {
    expect(tabStopDay('2026-12', '2026-12-09', '2026-12-01')).toBe('2026-12-09');
    expect(tabStopDay('2026-12', '2027-01-09', '2026-12-01')).toBe('2026-12-01');
    expect(tabStopDay('2027-02', '2027-01-09', '2026-12-01')).toBe('2027-02-01');
  });
});

describe('day names', () => {
  const win = (id: string, title: string, status: CalendarWindow['status'], startsAt: string, endsAt: string): CalendarWindow => ({
    id, title, startsAt, endsAt, status, conflictCount: id === 'b' ? 1 : 0, touchesCritical: false, workType: null, elements: [],
  });
  const marks = buildMarkedDays({
    windows: [
      win('a', 'Rectifier swap', 'planned', '2027-01-08T08:00:00Z', '2027-01-08T10:00:00Z'),
      win('b', 'Fibre splice', 'draft', '2027-01-08T12:00:00Z', '2027-01-08T13:00:00Z'),
    ],
    freezes: [{ id: 'f', title: 'Trade fair', startsAt: '2027-01-09T00:00:00Z', endsAt: '2027-01-10T00:00:00Z' }],
    timeZone: 'UTC', today: '2027-01-08',
  });

  test('every day reads weekday, date, month and year, then today, its windows with statuses, conflicts, freezes', () => {
    expect(dayName('2027-01-08')).toBe('Fri 8 January 2027');
    expect(dayLabel('2027-01-08', marks['2027-01-08']))
      .toBe('Fri 8 January 2027, today, 2 windows: Rectifier swap (Planned), Fibre splice (Draft), with a conflict');
    expect(dayLabel('2027-01-09', marks['2027-01-09'])).toBe('Sat 9 January 2027, no windows, freeze: Trade fair');
    expect(dayLabel('2027-01-11')).toBe('Mon 11 January 2027, no windows');
  });

  test('windows beyond the lanes drawn are still named', () => {
    const many = Array.from({ length: 5 }, (_, i) => win(`w${i}`, `Work ${i}`, 'assessed', `2027-01-12T0${i}:00:00Z`, `2027-01-12T0${i}:30:00Z`));
    const mark = buildMarkedDays({ windows: many, freezes: [], timeZone: 'UTC', today: '2027-01-01' })['2027-01-12'];
    expect(mark.overflowCount).toBeGreaterThan(0);
    expect(dayLabel('2027-01-12', mark)).toBe(`Tue 12 January 2027, 5 windows: ${many.map((w) => `${w.title} (Assessed)`).join(', ')}`);
  });
});

function Harness({ onDayPress = jest.fn() }: { onDayPress?: (day: string) => void }) {
  const [month, setMonth] = useState('2026-12');
  const [selected, setSelected] = useState('2026-12-03');
  const marks = buildMarkedDays({ windows: [], freezes: [], timeZone: 'UTC', today: '2026-12-01', selectedDay: selected });
  return (
    <MonthCalendar month={month} today="2026-12-01" selectedDay={selected} marks={marks} onMonthChange={setMonth}
      onDayPress={(day) => { onDayPress(day); setSelected(day); setMonth(monthOf(day)); }} />
  );
}

const cell = (day: string) => screen.getByTestId(`calendar.day_${day}`, { includeHiddenElements: true });
const tabStops = () => screen.getAllByTestId(/^calendar\.day_\d{4}-\d{2}-\d{2}$/, { includeHiddenElements: true })
  .filter((c) => c.props.tabIndex === 0).map((c) => c.props.testID);
const press = (day: string, key: string) => fireEvent(cell(day), 'keyDown', { key, preventDefault: jest.fn() });

describe('the month grid', () => {
  test('is a grid of rows: weekday column headers Monday first, then weeks of named day cells', () => {
    render(<Harness />);
    const grid = screen.getByTestId('calendar', { includeHiddenElements: true });
    expect(grid.props.role).toBe('grid');
    expect(grid).toHaveAccessibleName('December 2026');
    const headers = within(grid).getAllByTestId(/^calendar-weekday-/, { includeHiddenElements: true });
    expect(headers.map((h) => h.props.role)).toEqual(Array(7).fill('columnheader'));
    expect(headers.map((h) => h.props['aria-label'] ?? h.props.accessibilityLabel)).toEqual(
      ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday']);
    expect(headers[0]).toHaveTextContent('Mon');
    // 30 Nov (Monday) to 3 Jan: five weeks, each a row.
    expect(screen.getByTestId('calendar-week-2026-11-30', { includeHiddenElements: true }).props.role).toBe('row');
    // Each cell holds the day's button, named in full; the cell carries the selection.
    expect(screen.getByTestId('calendar.day_2026-12-03-cell', { includeHiddenElements: true }).props.role).toBe('gridcell');
    expect(cell('2026-12-03').props.role).toBe('button');
    expect(cell('2026-12-03')).toHaveAccessibleName('Thu 3 December 2026, no windows');
  });

  test('marks the selected day\'s cell with aria-selected and today\'s button with aria-current="date", no other day', () => {
    render(<Harness />);
    const cells = screen.getAllByTestId(/^calendar\.day_\d{4}-\d{2}-\d{2}-cell$/, { includeHiddenElements: true });
    expect(cells).toHaveLength(35);
    expect(cells.filter((c) => c.props['aria-selected'] === true).map((c) => c.props.testID)).toEqual(['calendar.day_2026-12-03-cell']);
    const buttons = screen.getAllByTestId(/^calendar\.day_\d{4}-\d{2}-\d{2}$/, { includeHiddenElements: true });
    expect(buttons.filter((b) => b.props['aria-current'] === 'date').map((b) => b.props.testID)).toEqual(['calendar.day_2026-12-01']);
    // aria-selected belongs to the grid cell, never to a button.
    expect(buttons.filter((b) => b.props['aria-selected'] !== undefined)).toHaveLength(0);
  });

  test('one Tab stop, on the selected day; arrows move it without selecting; Space selects', () => {
    const onDayPress = jest.fn();
    render(<Harness onDayPress={onDayPress} />);
    expect(tabStops()).toEqual(['calendar.day_2026-12-03']);
    press('2026-12-03', 'ArrowRight');
    expect(tabStops()).toEqual(['calendar.day_2026-12-04']);
    press('2026-12-04', 'ArrowDown');
    expect(tabStops()).toEqual(['calendar.day_2026-12-11']);
    press('2026-12-11', 'Home');
    expect(tabStops()).toEqual(['calendar.day_2026-12-07']);
    expect(onDayPress).not.toHaveBeenCalled();
    press('2026-12-07', ' ');
    expect(onDayPress).toHaveBeenCalledWith('2026-12-07');
    expect(tabStops()).toEqual(['calendar.day_2026-12-07']);
  });

  test('moving past the days shown, or by Page Down, turns the month and keeps the Tab stop on the day moved to', () => {
    render(<Harness />);
    press('2026-12-03', 'ArrowDown');
    press('2026-12-10', 'ArrowDown');
    press('2026-12-17', 'ArrowDown');
    press('2026-12-24', 'ArrowDown');
    // 31 Dec is in this month; 7 Jan is not shown in December's weeks.
    press('2026-12-31', 'ArrowDown');
    expect(screen.getByTestId('calendar-month-title')).toHaveTextContent('January 2027');
    expect(tabStops()).toEqual(['calendar.day_2027-01-07']);
    press('2027-01-07', 'PageDown');
    expect(screen.getByTestId('calendar-month-title')).toHaveTextContent('February 2027');
    expect(tabStops()).toEqual(['calendar.day_2027-02-07']);
  });

  test('a day of the next month shown in the last week takes focus without turning the month; the header resets the stop', () => {
    render(<Harness />);
    press('2026-12-03', 'End');
    press('2026-12-06', 'ArrowDown');
    press('2026-12-13', 'ArrowDown');
    press('2026-12-20', 'ArrowDown');
    press('2026-12-27', 'ArrowDown');
    expect(screen.getByTestId('calendar-month-title')).toHaveTextContent('December 2026');
    expect(tabStops()).toEqual(['calendar.day_2027-01-03']);
    fireEvent.press(screen.getByTestId('calendar-next-month'));
    expect(tabStops()).toEqual(['calendar.day_2027-01-01']);
  });
});
