// Badges on a window: how many conflicts it has, and whether it touches a critical slice.
import { StyleSheet, Text, View } from 'react-native';
import { calendarColors, radii, space, type } from '@/constants/theme';
import type { CalendarWindow } from './calendar-types';

export function WindowBadges({ window }: { window: CalendarWindow }) {
  if (window.conflictCount <= 0 && !window.touchesCritical) return null;
  return (
    <View style={styles.row}>
      {window.conflictCount > 0 ? (
        <Text style={[styles.badge, styles.conflict]} testID={`window-${window.id}-conflict-badge`}>
          {window.conflictCount === 1 ? '1 conflict' : `${window.conflictCount} conflicts`}
        </Text>
      ) : null}
      {window.touchesCritical ? (
        <Text style={[styles.badge, styles.critical]} testID={`window-${window.id}-critical-badge`}>
          Critical slice
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  badge: {
    ...type.label,
    fontSize: 12,
    paddingHorizontal: space.sm,
    paddingVertical: 1,
    borderRadius: radii.pill,
    overflow: 'hidden',
  },
  conflict: { color: calendarColors.conflict, backgroundColor: calendarColors.conflictSoft },
  critical: { color: calendarColors.critical, backgroundColor: calendarColors.criticalSoft },
});
