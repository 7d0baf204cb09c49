// The month view: react-native-calendars with multi-period marks drawn by our own day cell, Monday first.
import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { Calendar, type DateData } from 'react-native-calendars';
import { colors, fonts, radii } from '@/constants/theme';
import { addDays, FIRST_WEEKDAY } from '@/components/time';
import { CalendarDay } from './calendar-day';
import type { MarkedDays } from './calendar-types';
import { MonthHeader } from './month-header';
import { CalendarLegend } from './calendar-legend';
import { statusesShown } from './calendar-marks';

type Props = {
  /** 'YYYY-MM' */
  month: string;
  today: string;
  marks: MarkedDays;
  onDayPress: (day: string) => void;
  onMonthChange: (month: string) => void;
  loading?: boolean;
};

function shiftMonth(month: string, by: number): string {
  return addDays(`${month}-15`, by * 30).slice(0, 7);
}

export function MonthCalendar({ month, today, marks, onDayPress, onMonthChange, loading }: Props) {
  const theme = useMemo(
    () => ({
      calendarBackground: colors.surface,
      textSectionTitleColor: colors.inkMuted,
      textDayHeaderFontFamily: fonts.medium,
      textDayHeaderFontSize: 12,
      weekVerticalMargin: 0,
      'stylesheet.calendar.main': { container: { paddingLeft: 0, paddingRight: 0 } },
      'stylesheet.calendar.header': { header: { height: 0 }, week: { flexDirection: 'row', justifyContent: 'space-around', paddingBottom: 6 } },
    }),
    [],
  );
  return (
    <View style={styles.panel} testID="calendar-month">
      <MonthHeader
        month={month}
        loading={loading}
        onPrevious={() => onMonthChange(shiftMonth(month, -1))}
        onNext={() => onMonthChange(shiftMonth(month, 1))}
        onToday={() => {
          onMonthChange(today.slice(0, 7));
          onDayPress(today);
        }}
      />
      <Calendar
        testID="calendar"
        initialDate={`${month}-01`}
        firstDay={FIRST_WEEKDAY}
        markingType="multi-period"
        markedDates={marks}
        dayComponent={CalendarDay as never}
        hideArrows
        renderHeader={() => null}
        onDayPress={(date: DateData) => onDayPress(date.dateString)}
        onMonthChange={(date: DateData) => {
          const next = date.dateString.slice(0, 7);
          if (next !== month) onMonthChange(next);
        }}
        theme={theme as never}
      />
      <CalendarLegend statuses={statusesShown(marks)} />
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    overflow: 'hidden',
  },
});
