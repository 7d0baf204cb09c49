// A window's status as a small coloured pill, in the calendar's status tones.
import { StyleSheet, Text, View } from 'react-native';
import type { WindowStatus } from '@/shared/windows';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

export function StatusBadge({ status, testID }: { status: WindowStatus; testID?: string }) {
  return (
    <View style={[styles.pill, { borderColor: calendarColors.status[status] }]} testID={testID}>
      <View style={[styles.dot, { backgroundColor: calendarColors.status[status] }]} />
      <Text style={styles.text}>{STATUS_LABELS[status]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: {
    flexDirection: 'row', alignItems: 'center', gap: space.xs, alignSelf: 'flex-start',
    borderWidth: 1.5, borderRadius: radii.pill, paddingHorizontal: space.sm, paddingVertical: space.xxs, backgroundColor: colors.surface,
  },
  dot: { width: 8, height: 8, borderRadius: radii.pill },
  text: { ...type.label, color: colors.ink },
});
