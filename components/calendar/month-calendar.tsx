// The month view: our header (title, previous / next, "Today"), the month grid with multi-day bars, the legend.
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii } from '@/constants/theme';
import { addDays } from '@/components/time';
import type { MarkedDays } from './calendar-types';
import { MonthGrid } from './month-grid';
import { MonthHeader, monthTitle } from './month-header';
import { CalendarLegend } from './calendar-legend';
import { draftsShown, statusesShown } from './calendar-marks';

type Props = {
  /** 'YYYY-MM' */
  month: string;
  today: string;
  selectedDay?: string;
  marks: MarkedDays;
  onDayPress: (day: string) => void;
  onMonthChange: (month: string) => void;
  loading?: boolean;
};

function shiftMonth(month: string, by: number): string {
  return addDays(`${month}-15`, by * 30).slice(0, 7);
}

export function MonthCalendar({ month, today, selectedDay, marks, onDayPress, onMonthChange, loading }: Props) {
  // Each use of the header starts the grid afresh, so its Tab stop follows the selection again.
  const [headerUses, setHeaderUses] = useState(0);
  const fromHeader = (action: () => void) => () => {
    setHeaderUses((n) => n + 1);
    action();
  };
  return (
    <View style={styles.panel} testID="calendar-month">
      <MonthHeader
        month={month}
        loading={loading}
        onPrevious={fromHeader(() => onMonthChange(shiftMonth(month, -1)))}
        onNext={fromHeader(() => onMonthChange(shiftMonth(month, 1)))}
        onToday={fromHeader(() => {
          onMonthChange(today.slice(0, 7));
          onDayPress(today);
        })}
      />
      <MonthGrid
        key={headerUses}
        month={month}
        label={monthTitle(month)}
        today={today}
        selectedDay={selectedDay}
        marks={marks}
        onDayPress={onDayPress}
        onMonthChange={onMonthChange}
      />
      <CalendarLegend statuses={statusesShown(marks)} drafts={draftsShown(marks)} />
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
