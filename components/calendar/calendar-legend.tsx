// What the marks mean: a window bar's colour and status letter per status (the statuses on screen), today's ring,
// the conflict dot and freeze hatching. Bar colours and letters come from the same statusColor and STATUS_MARKS
// as the bars themselves.
import { StyleSheet, Text, View } from 'react-native';
import type { WindowStatus } from '@/shared/windows';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import { calendarColors, colors, fonts, radii, space, type } from '@/constants/theme';
import { STATUS_MARKS, statusColor } from './calendar-marks';
import { DraftHatch, FreezeHatch } from './freeze-hatch';

/**
 * `statuses`: those of the windows drawn this month; with none, a neutral key says that bars are windows.
 * `drafts`: a draft campaign's window is drawn, so the outlined "Draft" bar is explained.
 */
export function CalendarLegend({ statuses = [], drafts = false }: { statuses?: readonly WindowStatus[]; drafts?: boolean }) {
  return (
    <View style={styles.row} testID="calendar-legend">
      {statuses.map((status) => (
        <View key={status} style={styles.item} testID={`calendar-legend-${status}`}>
          <View style={[styles.bar, { backgroundColor: statusColor(status) }]} testID={`calendar-legend-swatch-${status}`}>
            <Text style={styles.barMark} aria-hidden>{STATUS_MARKS[status]}</Text>
          </View>
          <Text style={styles.text}>{STATUS_LABELS[status]}</Text>
        </View>
      ))}
      {drafts ? (
        <View style={styles.item} testID="calendar-legend-campaign-draft">
          <View style={[styles.bar, styles.draftBar]}>
            <DraftHatch />
          </View>
          <Text style={styles.text}>Draft campaign, not booked</Text>
        </View>
      ) : null}
      <View style={styles.item}>
        <View style={styles.today} />
        <Text style={styles.text}>Today</Text>
      </View>
      <View style={styles.item}>
        <View style={styles.conflict} />
        <Text style={styles.text}>Conflict</Text>
      </View>
      <View style={styles.item}>
        <View style={styles.freeze}>
          <FreezeHatch />
        </View>
        <Text style={styles.text}>Freeze</Text>
      </View>
      {statuses.length === 0 ? (
        <View style={styles.item}>
          <View style={[styles.bar, styles.neutralBar]} />
          <Text style={styles.text}>Window (colour and letter = status)</Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs, paddingHorizontal: space.lg, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  text: { ...type.caption, color: colors.inkMuted },
  today: { width: 14, height: 14, borderRadius: radii.pill, borderWidth: 2, borderColor: calendarColors.todayRing },
  conflict: { width: 8, height: 8, borderRadius: radii.pill, backgroundColor: calendarColors.conflict },
  freeze: { width: 18, height: 14, borderRadius: radii.sm, overflow: 'hidden' },
  bar: { width: 22, height: 14, borderRadius: 3, alignItems: 'center', justifyContent: 'center' },
  // The same white letter with a dark halo as on the bars.
  barMark: {
    fontFamily: fonts.bold, fontSize: 10, lineHeight: 14, color: calendarColors.onSelected,
    textShadowColor: 'rgba(0, 0, 0, 0.45)', textShadowRadius: 2, textShadowOffset: { width: 0, height: 0 },
  },
  neutralBar: { backgroundColor: colors.border },
  draftBar: { backgroundColor: colors.surface, borderWidth: 1.5, borderStyle: 'dashed', borderColor: colors.inkMuted, overflow: 'hidden' },
});
