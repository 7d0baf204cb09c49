// The month as an ARIA grid: a row of weekday column headers, then one row per week of day cells. One Tab stop
// (the selected day, else today, else the 1st); the arrow keys, Home / End and Page Up / Page Down move focus
// (see grid-keys.ts), Enter or Space selects. Built here rather than with react-native-calendars' Calendar,
// whose week rows cannot carry the row role a grid needs and whose header is announced as an unnamed slider.
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { StyleSheet, Text, View, type View as ViewType } from 'react-native';
import { addDays, FIRST_WEEKDAY, monthOf, visibleDays } from '@/components/time';
import { colors, fonts } from '@/constants/theme';
import { CalendarDay } from './calendar-day';
import type { MarkedDays } from './calendar-types';
import { nextFocusDay, tabStopDay } from './grid-keys';
import type { KeyPress } from '@/components/key-props';

type Props = {
  /** 'YYYY-MM' */
  month: string;
  /** the grid's name, e.g. "December 2026" */
  label: string;
  today: string;
  selectedDay?: string;
  marks: MarkedDays;
  onDayPress: (day: string) => void;
  onMonthChange: (month: string) => void;
};

const WEEKDAY_NAMES = ['Sunday', 'Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday'] as const;
const WEEKDAYS = Array.from({ length: 7 }, (_, i) => WEEKDAY_NAMES[(FIRST_WEEKDAY + i) % 7]);

/** The weeks month `month` shows, each seven day keys from FIRST_WEEKDAY on. */
export function weeksOf(month: string): string[][] {
  const { firstDay, lastDay } = visibleDays(month);
  const weeks: string[][] = [];
  for (let start = firstDay; start <= lastDay; start = addDays(start, 7)) {
    weeks.push(Array.from({ length: 7 }, (_, i) => addDays(start, i)));
  }
  return weeks;
}

export function MonthGrid({ month, label, today, selectedDay, marks, onDayPress, onMonthChange }: Props) {
  const weeks = useMemo(() => weeksOf(month), [month]);
  const firstShown = weeks[0][0];
  const lastShown = weeks[weeks.length - 1][6];
  const shown = (day: string) => day >= firstShown && day <= lastShown;
  // The day last pressed or moved to, and the month shown then: the Tab stop while that month is on screen,
  // else the selection rule applies. The month header remounts the grid (see month-calendar.tsx) to drop it.
  const [moved, setMoved] = useState<{ day: string; month: string } | null>(null);
  const stop = moved && moved.month === month && shown(moved.day) ? moved.day : tabStopDay(month, selectedDay, today);
  const cells = useRef(new Map<string, ViewType>());
  const focusPending = useRef<string | null>(null);

  useEffect(() => {
    if (focusPending.current !== stop) return;
    focusPending.current = null;
    (cells.current.get(stop) as unknown as { focus?: () => void } | undefined)?.focus?.();
  }, [stop]);

  const press = useCallback((day: string) => {
    setMoved({ day, month: monthOf(day) });
    onDayPress(day);
  }, [onDayPress]);

  const keyDown = useCallback((day: string, event: KeyPress) => {
    if (event.key === ' ' || event.key === 'Spacebar') {
      event.preventDefault?.();
      press(day);
      return;
    }
    const next = nextFocusDay(day, event.key);
    if (!next) return;
    event.preventDefault?.();
    const byMonth = event.key === 'PageUp' || event.key === 'PageDown';
    const offGrid = next < firstShown || next > lastShown;
    const toMonth = monthOf(next) !== month && (byMonth || offGrid) ? monthOf(next) : month;
    setMoved({ day: next, month: toMonth });
    focusPending.current = next;
    if (toMonth !== month) onMonthChange(toMonth);
  }, [press, month, firstShown, lastShown, onMonthChange]);

  return (
    <View role="grid" aria-label={label} testID="calendar" style={styles.grid}>
      <View role="row" style={styles.row}>
        {WEEKDAYS.map((name) => (
          <View key={name} role="columnheader" aria-label={name} style={styles.weekday} testID={`calendar-weekday-${name.toLowerCase()}`}>
            <Text style={styles.weekdayText}>{name.slice(0, 3)}</Text>
          </View>
        ))}
      </View>
      {weeks.map((week) => (
        <View key={week[0]} role="row" style={styles.row} testID={`calendar-week-${week[0]}`}>
          {week.map((day) => (
            <CalendarDay
              key={day}
              day={day}
              outside={monthOf(day) !== month}
              mark={marks[day]}
              tabStop={day === stop}
              onPress={press}
              onKeyDown={keyDown}
              cellRef={(node) => {
                if (node) cells.current.set(day, node);
                else cells.current.delete(day);
              }}
              testID={`calendar.day_${day}`}
            />
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { backgroundColor: colors.surface },
  row: { flexDirection: 'row' },
  weekday: { flex: 1, alignItems: 'center', paddingBottom: 6 },
  weekdayText: { fontFamily: fonts.medium, fontSize: 12, color: colors.inkMuted },
});
