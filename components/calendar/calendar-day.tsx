// One day cell of the month grid: the date (today ringed, the selection filled), a conflict dot, the windows' bars
// on their lanes with a status cue in text, "+n" for more, and freeze hatching behind. A grid cell (selected or
// not) holding the day's button with one accessible name (see day-label.ts); the month grid moves focus between
// the buttons with the arrow keys.
import type { Ref } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View, type Role, type View as ViewType } from 'react-native';
import { calendarColors, colors, fonts, radii, space, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';
import { STATUS_MARKS } from './calendar-marks';
import type { CalendarDayMark } from './calendar-types';
import { dayLabel } from './day-label';
import { keyDownProps, type KeyPress } from '@/components/key-props';
import { DraftHatch, FreezeHatch } from './freeze-hatch';

/** react-native's Role type has no 'gridcell'; react-native-web passes the role to the DOM as given. */
const GRIDCELL_ROLE = 'gridcell' as string as Role;

type Props = {
  /** 'YYYY-MM-DD' */
  day: string;
  /** a day of the neighbouring months that fills the first or last week row */
  outside: boolean;
  mark?: CalendarDayMark;
  /** the grid's one Tab stop; every other day is reached with the arrow keys */
  tabStop: boolean;
  onPress: (day: string) => void;
  onKeyDown: (day: string, event: KeyPress) => void;
  cellRef?: Ref<ViewType>;
  testID: string;
};

/** Room for the date and three lanes of titled bars; phones get slimmer bars so the agenda stays near the first screen. */
export const DAY_CELL_HEIGHT_PX = { phone: 76, wide: 92 } as const;
const BAR_HEIGHT_PX = { phone: 12, wide: 15 } as const;
const BAR_FONT_PX = { phone: 9, wide: 11 } as const;
const NUMBER_ROW_HEIGHT_PX = 28;

export function CalendarDay({ day, outside, mark, tabStop, onPress, onKeyDown, cellRef, testID }: Props) {
  const selected = mark?.selected === true;
  const today = mark?.today === true;
  const frozen = (mark?.freezeTitles.length ?? 0) > 0;
  const size = useWindowDimensions().width >= WIDE_LAYOUT_MIN_WIDTH_PX ? 'wide' : 'phone';
  return (
    <View role={GRIDCELL_ROLE} aria-selected={selected} testID={`${testID}-cell`} style={[styles.cell, { height: DAY_CELL_HEIGHT_PX[size] }]}>
      {frozen ? <FreezeHatch /> : null}
      {/* The bars repeat what the day's name already says, so assistive technology skips them. */}
      <View style={[styles.lanes, outside && styles.faded]} aria-hidden>
        {(mark?.periods ?? []).map((period, lane) => (
          <View
            key={lane}
            testID={period.windowId ? `${testID}-bar-${period.windowId}` : undefined}
            style={[
              styles.bar,
              { backgroundColor: period.color, height: BAR_HEIGHT_PX[size] },
              period.draft && styles.draftBar,
              period.startingDay && styles.barStart,
              period.endingDay && styles.barEnd,
            ]}
          >
            {period.draft ? <DraftHatch /> : null}
            {period.draft ? (
              <Text style={[styles.draftTitle, { fontSize: BAR_FONT_PX[size], lineHeight: BAR_HEIGHT_PX[size] - 3 }]} numberOfLines={1}
                testID={period.windowId ? `${testID}-bar-${period.windowId}-mark` : undefined}>
                <Text style={styles.barMark}>Draft</Text>
                {period.showTitle && period.title ? ` ${period.title}` : ''}
              </Text>
            ) : period.status ? (
              <Text style={[styles.barTitle, { fontSize: BAR_FONT_PX[size], lineHeight: BAR_HEIGHT_PX[size] }]} numberOfLines={1}>
                <Text style={styles.barMark} testID={period.windowId ? `${testID}-bar-${period.windowId}-mark` : undefined}>
                  {STATUS_MARKS[period.status]}
                </Text>
                {period.showTitle && period.title ? ` ${period.title}` : ''}
              </Text>
            ) : null}
          </View>
        ))}
      </View>
      {mark && mark.overflowCount > 0 ? <Text style={styles.more} aria-hidden>+{mark.overflowCount}</Text> : null}
      {/* The day's button covers the whole cell for the pointer; its only text is the date, which its name starts
          from, so the name holds what is visible (the bars' words sit outside it). */}
      <Pressable
        ref={cellRef}
        testID={testID}
        role="button"
        aria-label={dayLabel(day, mark)}
        aria-current={today ? 'date' : undefined}
        tabIndex={tabStop ? 0 : -1}
        onPress={() => onPress(day)}
        {...keyDownProps((event) => onKeyDown(day, event))}
        style={styles.button}
      >
        <View style={styles.numberRow}>
          <View style={[styles.number, today && styles.today, selected && styles.selected]}>
            <Text style={[styles.numberText, outside && styles.outside, selected && styles.selectedText]}>{Number(day.slice(8))}</Text>
          </View>
          {mark?.hasConflict ? <View style={styles.conflictDot} testID={`${testID}-conflict`} /> : null}
        </View>
      </Pressable>
    </View>
  );
}

const styles = StyleSheet.create({
  // Seven equal columns whatever the bars' titles say.
  cell: {
    flex: 1,
    minWidth: 0,
    alignSelf: 'stretch',
    paddingTop: space.xs,
    borderTopWidth: 1,
    borderTopColor: colors.surfaceSunken,
    overflow: 'hidden',
  },
  button: { position: 'absolute', top: 0, right: 0, bottom: 0, left: 0, paddingTop: space.xs },
  numberRow: { flexDirection: 'row', justifyContent: 'center', alignItems: 'center', height: NUMBER_ROW_HEIGHT_PX },
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
  // Below the date, which the button draws on top.
  lanes: { marginTop: NUMBER_ROW_HEIGHT_PX + 3, gap: 2 },
  faded: { opacity: 0.45 },
  bar: { overflow: 'hidden', justifyContent: 'center' },
  // White on the status tones; a dark halo keeps it legible on the paler ones (draft, withdrawn).
  barTitle: {
    fontFamily: fonts.semibold, color: calendarColors.onSelected, paddingHorizontal: 3,
    textShadowColor: 'rgba(0, 0, 0, 0.45)', textShadowRadius: 2, textShadowOffset: { width: 0, height: 0 },
  },
  barMark: { fontFamily: fonts.bold },
  // A campaign's window not booked yet: an outline on light hatching, dark text, so it never reads as a booked bar.
  draftBar: { backgroundColor: colors.surface, borderWidth: 1.5, borderStyle: 'dashed', borderColor: colors.inkMuted },
  draftTitle: { fontFamily: fonts.semibold, color: colors.ink, paddingHorizontal: 3 },
  barStart: { marginLeft: 3, borderTopLeftRadius: 3, borderBottomLeftRadius: 3 },
  barEnd: { marginRight: 3, borderTopRightRadius: 3, borderBottomRightRadius: 3 },
  more: { fontFamily: fonts.medium, fontSize: 10, lineHeight: 12, color: colors.inkMuted, textAlign: 'center' },
});
