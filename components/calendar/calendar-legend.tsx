// What the marks mean beyond status colours: today's ring, the conflict dot and freeze hatching.
import { StyleSheet, Text, View } from 'react-native';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';
import { FreezeHatch } from './freeze-hatch';

export function CalendarLegend() {
  return (
    <View style={styles.row} testID="calendar-legend">
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
      <View style={styles.item}>
        <View style={styles.bar} />
        <Text style={styles.text}>Window (colour = status)</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, paddingHorizontal: space.lg, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  text: { ...type.caption, color: colors.inkMuted },
  today: { width: 14, height: 14, borderRadius: radii.pill, borderWidth: 2, borderColor: calendarColors.todayRing },
  conflict: { width: 8, height: 8, borderRadius: radii.pill, backgroundColor: calendarColors.conflict },
  freeze: { width: 18, height: 14, borderRadius: radii.sm, overflow: 'hidden' },
  bar: { width: 22, height: 6, borderRadius: 3, backgroundColor: calendarColors.status.assessed },
});
