// Calendar: marks for windows across midnight and freezes, conflict/critical badges, the selected day's agenda,
// and the list request for the visible month.
import type { ReactElement } from 'react';
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { buildMarkedDays, windowsOnDay } from '@/components/calendar/calendar-marks';
import { CalendarView } from '@/components/calendar/calendar-view';
import type { CalendarFreeze, CalendarWindow } from '@/components/calendar/calendar-types';
import { useCalendarState } from '@/components/calendar/use-calendar-state';
import { listParams, NO_FILTERS } from '@/components/calendar/window-filters';
import { windowListPath } from '@/hooks/queries/windows-list';
import { calendarColors } from '@/constants/theme';
import { visibleRange } from '@/components/time';

// A real link's own navigation is the browser's; here Link stands in as "a press goes to href".
const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  useRouter: () => ({ push: mockPush }),
  Link: ({ href, children }: { href: unknown; children: ReactElement<{ onPress?: () => void }> }) =>
    require('react').cloneElement(children, { href, onPress: () => mockPush(href) }),
}));
beforeEach(() => mockPush.mockReset());

const BERLIN = 'Europe/Berlin';

function win(id: string, startsAt: string, endsAt: string, extra: Partial<CalendarWindow> = {}): CalendarWindow {
  return {
    id,
    title: `Window ${id}`,
    startsAt,
    endsAt,
    status: 'assessed',
    conflictCount: 0,
    touchesCritical: false,
    workType: 'software upgrade',
    elements: [{ kind: 'site', id: `site-${id}`, effect: 'down', fraction: null }],
    ...extra,
  };
}

// 23:00 CET on Thu 3 Dec to 03:00 CET on Fri 4 Dec.
const overnight = win('w-night', '2026-12-03T22:00:00.000Z', '2026-12-04T02:00:00.000Z', { conflictCount: 2 });
// 10:00–14:00 CET on Fri 4 Dec, touching a critical slice.
const daytime = win('w-day', '2026-12-04T09:00:00.000Z', '2026-12-04T13:00:00.000Z', { touchesCritical: true, status: 'draft' });
// 09:00–11:00 CET on Mon 7 Dec.
const monday = win('w-mon', '2026-12-07T08:00:00.000Z', '2026-12-07T10:00:00.000Z');
const freeze: CalendarFreeze = { id: 'f-1', title: 'Year-end freeze', startsAt: '2026-12-23T23:00:00.000Z', endsAt: '2026-12-26T23:00:00.000Z' };

describe('marks', () => {
  const marks = buildMarkedDays({ windows: [daytime, overnight, monday], freezes: [freeze], timeZone: BERLIN, selectedDay: '2026-12-04', today: '2026-12-01' });

  test('a window crossing midnight is one bar over two days: starts on the 3rd, ends on the 4th, same lane', () => {
    const thu = marks['2026-12-03'].periods;
    const fri = marks['2026-12-04'].periods;
    expect(thu).toHaveLength(1);
    expect(thu[0]).toMatchObject({ color: calendarColors.status.assessed, startingDay: true, endingDay: false, windowId: 'w-night', showTitle: true });
    // Friday is no week start: the bar continues without repeating its title.
    expect(fri[0]).toMatchObject({ color: calendarColors.status.assessed, startingDay: false, endingDay: true, windowId: 'w-night', showTitle: false });
    // The daytime window starts later and takes the next lane on the 4th.
    expect(fri[1]).toMatchObject({ color: calendarColors.status.draft, startingDay: true, endingDay: true, windowId: 'w-day' });
    expect(marks['2026-12-05']).toBeUndefined();
  });

  test('the same window in New York falls on the 3rd only', () => {
    const ny = buildMarkedDays({ windows: [overnight], freezes: [], timeZone: 'America/New_York', today: '2026-12-01' });
    expect(ny['2026-12-03'].periods).toHaveLength(1);
    expect(ny['2026-12-04']).toBeUndefined();
  });

  test('freezes shade the local days they cover, conflicts and today and the selection are marked', () => {
    expect(marks['2026-12-24'].freezeTitles).toEqual(['Year-end freeze']);
    expect(marks['2026-12-26'].freezeTitles).toEqual(['Year-end freeze']);
    expect(marks['2026-12-27']).toBeUndefined(); // ends at local midnight
    expect(marks['2026-12-23']).toBeUndefined();
    expect(marks['2026-12-03'].hasConflict).toBe(true);
    expect(marks['2026-12-07'].hasConflict).toBe(false);
    expect(marks['2026-12-01'].today).toBe(true);
    expect(marks['2026-12-04'].selected).toBe(true);
  });

  test('a lane is kept free with a transparent filler so a later bar lines up with its other days', () => {
    const early = win('a', '2026-12-10T08:00:00Z', '2026-12-10T09:00:00Z');
    const long = win('b', '2026-12-10T10:00:00Z', '2026-12-11T10:00:00Z');
    const laneMarks = buildMarkedDays({ windows: [early, long], freezes: [], timeZone: 'UTC', today: '2026-12-01' });
    expect(laneMarks['2026-12-11'].periods.map((p) => p.color)).toEqual(['transparent', calendarColors.status.assessed]);
  });

  test('the agenda of a day lists the windows overlapping it, earliest first', () => {
    expect(windowsOnDay([daytime, overnight, monday], '2026-12-04', BERLIN).map((w) => w.id)).toEqual(['w-night', 'w-day']);
    expect(windowsOnDay([daytime, overnight, monday], '2026-12-03', BERLIN).map((w) => w.id)).toEqual(['w-night']);
  });
});

describe('the list request', () => {
  test('asks for the weeks December 2026 shows in Berlin, with the API-side filters', () => {
    const params = listParams(visibleRange('2026-12', BERLIN), { ...NO_FILTERS, mine: true, statuses: ['draft', 'assessed'] });
    expect(windowListPath(params)).toBe(
      '/api/windows?from=2026-11-29T23%3A00%3A00.000Z&to=2027-01-03T23%3A00%3A00.000Z&mine=true&status=assessed%2Cdraft',
    );
  });
});

type HarnessProps = {
  onOpenWindow?: (id: string) => void; canBook?: boolean; windowHref?: (id: string) => string | null;
  elementName?: (kind: 'site' | 'span', id: string) => string;
};

function Harness({ onOpenWindow = jest.fn(), canBook = true, windowHref, elementName }: HarnessProps) {
  const state = useCalendarState(BERLIN, '2026-12-03');
  return (
    <CalendarView
      state={state}
      timeZone={BERLIN}
      windows={[overnight, daytime, monday]}
      freezes={[freeze]}
      tenants={[]}
      refreshing={false}
      canBook={canBook}
      onBook={jest.fn()}
      onOpenWindow={onOpenWindow}
      windowHref={windowHref}
      elementName={elementName}
    />
  );
}

describe('calendar view', () => {
  test('agenda rows name the equipment as people call it, not by id', () => {
    render(<Harness elementName={(kind, id) => `${kind === 'site' ? 'Site' : 'Span'} named ${id.replace('site-', '')}`} />);
    expect(within(screen.getByTestId('calendar-agenda')).getByTestId('agenda-window-w-night')).toHaveTextContent(/Site named w-night/);
    expect(within(screen.getByTestId('calendar-agenda')).getByTestId('agenda-window-w-night')).not.toHaveTextContent(/site-w-night/);
  });

  test('the selected day lists its windows with times in the zone, named; tapping another day changes the list', () => {
    render(<Harness />);
    const agenda = () => within(screen.getByTestId('calendar-agenda'));
    expect(screen.getByTestId('calendar-agenda-day')).toHaveTextContent('Thursday 3 December 2026');
    expect(agenda().getByTestId('agenda-window-w-night-when')).toHaveTextContent('Thu 3 Dec, 23:00 – Fri 4 Dec, 03:00 CET · 4 h');
    expect(agenda().queryByTestId('agenda-window-w-day')).toBeNull();

    fireEvent.press(screen.getByTestId('calendar.day_2026-12-04', { includeHiddenElements: true }));
    expect(screen.getByTestId('calendar-agenda-day')).toHaveTextContent('Friday 4 December 2026');
    expect(agenda().getByTestId('agenda-window-w-night')).toBeTruthy();
    expect(agenda().getByTestId('agenda-window-w-day-when')).toHaveTextContent('Fri 4 Dec, 10:00 – 14:00 CET · 4 h');
    expect(agenda().queryByTestId('agenda-window-w-mon')).toBeNull();
  });

  test('a badge shows on windows with conflicts and on those touching a critical slice, not on others', () => {
    render(<Harness />);
    fireEvent.press(screen.getByTestId('calendar.day_2026-12-04', { includeHiddenElements: true }));
    expect(screen.getByTestId('window-w-night-conflict-badge')).toHaveTextContent('2 conflicts');
    expect(screen.queryByTestId('window-w-night-critical-badge')).toBeNull();
    expect(screen.getByTestId('window-w-day-critical-badge')).toHaveTextContent('Critical slice');
    expect(screen.queryByTestId('window-w-day-conflict-badge')).toBeNull();
    expect(screen.getByTestId('calendar.day_2026-12-04-conflict', { includeHiddenElements: true })).toBeTruthy();
  });

  test('a frozen day shows the freeze in its agenda; an empty day says so', () => {
    render(<Harness />);
    fireEvent.press(screen.getByTestId('calendar.day_2026-12-25', { includeHiddenElements: true }));
    expect(screen.getByTestId('agenda-freeze-f-1')).toHaveTextContent(/Freeze: Year-end freeze/);
    expect(screen.getByTestId('calendar-agenda-empty')).toBeTruthy();
  });

  test('a row opens its window; month navigation moves the month and the selection', () => {
    const onOpenWindow = jest.fn();
    render(<Harness onOpenWindow={onOpenWindow} />);
    fireEvent.press(screen.getByTestId('agenda-window-w-night'));
    expect(onOpenWindow).toHaveBeenCalledWith('w-night');
    fireEvent.press(screen.getByTestId('calendar-next-month'));
    expect(screen.getByTestId('calendar-month-title')).toHaveTextContent('January 2027');
    expect(screen.getByTestId('calendar-agenda-day')).toHaveTextContent('Friday 1 January 2027');
  });

  test('an agenda row is a link that opens its window on Enter and on Space, and lets other keys pass', () => {
    const onOpenWindow = jest.fn();
    render(<Harness onOpenWindow={onOpenWindow} />);
    const row = screen.getByTestId('agenda-window-w-night');
    expect(row.props.role).toBe('link');
    // Its name is its text: title, status in words, time.
    expect(row).toHaveTextContent(/Window w-night\s*Assessed\s*Thu 3 Dec, 23:00/);
    const preventDefault = jest.fn();
    fireEvent(row, 'keyDown', { key: 'Enter', preventDefault });
    expect(onOpenWindow).toHaveBeenCalledWith('w-night');
    expect(preventDefault).toHaveBeenCalled();
    fireEvent(row, 'keyDown', { key: ' ', preventDefault });
    expect(onOpenWindow).toHaveBeenCalledTimes(2);
    fireEvent(row, 'keyDown', { key: 'ArrowDown', preventDefault: jest.fn() });
    expect(onOpenWindow).toHaveBeenCalledTimes(2);
  });

  test('given an href, the row is a real link to it: a press follows it, and Space opens it too', () => {
    render(<Harness windowHref={(id) => `/windows/${id}`} />);
    const row = screen.getByTestId('agenda-window-w-night');
    expect(row.props.href).toBe('/windows/w-night');
    fireEvent.press(row);
    expect(mockPush).toHaveBeenLastCalledWith('/windows/w-night');
    mockPush.mockReset();
    fireEvent(row, 'keyDown', { key: ' ', preventDefault: jest.fn() });
    expect(mockPush).toHaveBeenCalledWith('/windows/w-night');
  });

  test('a window with nothing to open (a null href) is plain text, not a link', () => {
    const onOpenWindow = jest.fn();
    render(<Harness onOpenWindow={onOpenWindow} windowHref={() => null} />);
    const row = screen.getByTestId('agenda-window-w-night');
    expect(row.props.role).toBeUndefined();
    expect(row).not.toHaveTextContent(/›/);
    fireEvent(row, 'keyDown', { key: 'Enter', preventDefault: jest.fn() });
    expect(onOpenWindow).not.toHaveBeenCalled();
  });

  test('the text filter narrows the windows; "Book a window" only for those who may book', () => {
    render(<Harness canBook={false} />);
    expect(screen.queryByTestId('calendar-book')).toBeNull();
    fireEvent.press(screen.getByTestId('calendar-filters-toggle'));
    fireEvent.changeText(screen.getByTestId('filter-element'), 'site-w-mon');
    fireEvent.press(screen.getByTestId('calendar.day_2026-12-03', { includeHiddenElements: true }));
    expect(screen.queryByTestId('agenda-window-w-night')).toBeNull();
    expect(screen.getByTestId('calendar-agenda-empty')).toHaveTextContent(/Filters are on/);
  });
});
