// One day cell of the month view: the date (today ringed, the selection filled), a conflict dot,
// the windows' bars on their lanes, "+n" for more, and freeze hatching behind.
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { DateData } from 'react-native-calendars';
import { calendarColors, colors, fonts, radii, space, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';
import type { CalendarDayMark } from './calendar-types';
import { FreezeHatch } from './freeze-hatch';

type Props = {
  date?: DateData;
  state?: string;
  marking?: CalendarDayMark;
  onPress?: (date?: DateData) => void;
  testID?: string;
  accessibilityLabel?: string;
  children?: React.ReactNode;
};

/** Room for the date and three lanes of titled bars; phones get slimmer bars so the agenda stays near the first screen. */
export const DAY_CELL_HEIGHT_PX = { phone: 76, wide: 92 } as const;
const BAR_HEIGHT_PX = { phone: 12, wide: 15 } as const;
const BAR_FONT_PX = { phone: 9, wide: 11 } as const;

export function CalendarDay({ date, state, marking, onPress, testID, accessibilityLabel, children }: Props) {
  const outside = state === 'disabled';
  const selected = marking?.selected === true;
  const today = marking?.today === true;
  const frozen = (marking?.freezeTitles.length ?? 0) > 0;
  const size = useWindowDimensions().width >= WIDE_LAYOUT_MIN_WIDTH_PX ? 'wide' : 'phone';
  const height = DAY_CELL_HEIGHT_PX[size];
  return (
    <Pressable
      testID={testID}
      role="button"
      accessibilityLabel={marking?.accessibilityLabel ?? accessibilityLabel}
      accessibilityState={{ selected }}
      aria-selected={selected}
      onPress={() => onPress?.(date)}
      style={({ pressed }) => [styles.cell, { height }, pressed && styles.pressed]}
    >
      {frozen ? <FreezeHatch /> : null}
      <View style={styles.numberRow}>
        <View style={[styles.number, today && styles.today, selected && styles.selected]}>
          <Text style={[styles.numberText, outside && styles.outside, selected && styles.selectedText]}>{children}</Text>
        </View>
        {marking?.hasConflict ? <View style={styles.conflictDot} testID={`${testID}-conflict`} /> : null}
      </View>
      <View style={[styles.lanes, outside && styles.faded]}>
        {(marking?.periods ?? []).map((period, lane) => (
          <View
            key={lane}
            testID={period.windowId ? `${testID}-bar-${period.windowId}` : undefined}
            accessibilityLabel={period.label}
            aria-label={period.label}
            style={[
              styles.bar,
              { backgroundColor: period.color, height: BAR_HEIGHT_PX[size] },
              period.startingDay && styles.barStart,
              period.endingDay && styles.barEnd,
            ]}
          >
            {period.showTitle && period.title ? (
              <Text style={[styles.barTitle, { fontSize: BAR_FONT_PX[size], lineHeight: BAR_HEIGHT_PX[size] }]} numberOfLines={1}>
                {period.title}
              </Text>
            ) : null}
          </View>
        ))}
      </View>
      {marking && marking.overflowCount > 0 ? <Text style={styles.more}>+{marking.overflowCount}</Text> : null}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  cell: {
    alignSelf: 'stretch',
    paddingTop: space.xs,
    borderTopWidth: 1,
    borderTopColor: colors.surfaceSunken,
    overflow: 'hidden',
  },
  pressed: { backgroundColor: colors.primarySoft },
  numberRow: { flexDirection: 'row', justifyContent: 'center', alignItems: 'center', height: 28 },
  number: { width: 28, height: 28, borderRadius: radii.pill, alignItems: 'center', justifyContent: 'center' },
  today: { borderWidth: 2, borderColor: calendarColors.todayRing },
  selected: { backgroundColor: calendarColors.selectedFill, borderColor: calendarColors.selectedFill },
  numberText: { fontFamily: fonts.medium, fontSize: 14, color: colors.ink },
  selectedText: { color: calendarColors.onSelected, fontFamily: fonts.semibold },
  outside: { color: calendarColors.outsideMonth },
  conflictDot: {
    position: 'absolute',
    top: 2,
    // Just right of the date's circle, whatever the cell's width.
    left: '50%',
    marginLeft: 13,
    width: 7,
    height: 7,
    borderRadius: radii.pill,
    backgroundColor: calendarColors.conflict,
  },
  lanes: { marginTop: 3, gap: 2 },
  faded: { opacity: 0.45 },
  bar: { overflow: 'hidden', justifyContent: 'center' },
  // White on the status tones; a dark halo keeps it legible on the paler ones (draft, withdrawn).
  barTitle: {
    fontFamily: fonts.semibold, color: calendarColors.onSelected, paddingHorizontal: 3,
    textShadowColor: 'rgba(0, 0, 0, 0.45)', textShadowRadius: 2, textShadowOffset: { width: 0, height: 0 },
  },
  barStart: { marginLeft: 3, borderTopLeftRadius: 3, borderBottomLeftRadius: 3 },
  barEnd: { marginRight: 3, borderTopRightRadius: 3, borderBottomRightRadius: 3 },
  more: { fontFamily: fonts.medium, fontSize: 10, lineHeight: 12, color: colors.inkMuted, textAlign: 'center' },
});
