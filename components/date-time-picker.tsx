// Pickers for the form's date and time fields: a month to tap a day on (react-native-calendars) and a list of
// clock times in 15-minute steps. Both open inline under their field, so they fit a 390 px phone and a desk alike;
// typing stays possible beside them.
import { Suspense } from 'react';
import { ScrollView, Pressable, StyleSheet, Text, View } from 'react-native';
import type { DateData } from 'react-native-calendars';
import { PickerMonth } from '@/components/date-picker-month';
import { FIRST_WEEKDAY } from '@/components/time';
import { colors, fonts, radii, space, type } from '@/constants/theme';

const CALENDAR_THEME = {
  calendarBackground: colors.surface,
  textSectionTitleColor: colors.inkMuted,
  textDayHeaderFontFamily: fonts.medium,
  textDayFontFamily: fonts.regular,
  selectedDayBackgroundColor: colors.primary,
  selectedDayTextColor: colors.onPrimary,
  todayTextColor: colors.primary,
  arrowColor: colors.primary,
  monthTextColor: colors.ink,
};

type DateProps = {
  /** 'YYYY-MM-DD' or null when nothing valid is typed yet. */
  value: string | null;
  /** Day to open on when `value` is null, 'YYYY-MM-DD'. */
  fallbackDay: string;
  onPick: (day: string) => void;
  testID: string;
};

export function DatePicker({ value, fallbackDay, onPick, testID }: DateProps) {
  return (
    <View style={styles.panel} testID={testID}>
      <Suspense fallback={<Text style={styles.hint} testID={`${testID}-loading`}>Loading the month…</Text>}>
        <PickerMonth
          testID={`${testID}-calendar`}
          initialDate={value ?? fallbackDay}
          firstDay={FIRST_WEEKDAY}
          markedDates={value ? { [value]: { selected: true } } : {}}
          onDayPress={(date: DateData) => onPick(date.dateString)}
          enableSwipeMonths
          theme={CALENDAR_THEME as never}
        />
      </Suspense>
    </View>
  );
}

const STEP_MINUTES = 15;
const pad = (n: number) => String(n).padStart(2, '0');

/** "00:00", "00:15", … "23:45": the clock times the picker offers. */
export const QUARTER_HOURS: readonly string[] = Array.from({ length: (24 * 60) / STEP_MINUTES }, (_, i) => {
  const minutes = i * STEP_MINUTES;
  return `${pad(Math.floor(minutes / 60))}:${pad(minutes % 60)}`;
});

type TimeProps = { value: string | null; onPick: (time: string) => void; testID: string };

export function TimePicker({ value, onPick, testID }: TimeProps) {
  return (
    <View style={styles.panel} testID={testID}>
      <Text style={styles.hint}>Times in 15-minute steps; type any other minute in the field.</Text>
      <ScrollView style={styles.times} contentContainerStyle={styles.timeGrid} nestedScrollEnabled>
        {QUARTER_HOURS.map((time) => {
          const selected = time === value;
          return (
            <Pressable key={time} role="button" aria-pressed={selected}
              onPress={() => onPick(time)} testID={`${testID}-${time.replace(':', '')}`}
              style={[styles.time, selected && styles.timeSelected]}>
              <Text style={[styles.timeText, selected && styles.timeTextSelected]}>{time}</Text>
            </Pressable>
          );
        })}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surface, padding: space.sm, gap: space.xs, maxWidth: 420 },
  hint: { ...type.caption, color: colors.inkMuted },
  times: { maxHeight: 196 },
  timeGrid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  time: { minWidth: 64, alignItems: 'center', paddingVertical: space.sm, borderRadius: radii.sm, borderWidth: 1, borderColor: colors.border },
  timeSelected: { backgroundColor: colors.primary, borderColor: colors.primary },
  timeText: { ...type.body, color: colors.ink },
  timeTextSelected: { color: colors.onPrimary },
});
