// The next maintenance windows, times shown in the viewer's zone with the zone named in the heading.
import { StyleSheet, Text, View } from 'react-native';
import type { Overview } from '@/shared/api';
import { formatWindowRange, viewerTimeZone } from '@/components/overview/time-format';
import { colors, radii, space, type } from '@/constants/theme';

export function NextWindows({ windows }: { windows: Overview['nextWindows'] }) {
  const timeZone = viewerTimeZone();
  return (
    <View style={styles.panel} testID="overview-next-windows">
      <View style={styles.header}>
        <Text style={styles.title} role="heading">
          Next windows
        </Text>
        <Text style={styles.zone}>Times in {timeZone}</Text>
      </View>
      {windows.length === 0 ? (
        <Text style={styles.empty}>No maintenance windows booked yet.</Text>
      ) : (
        windows.map((window, index) => (
          <View key={window.id} style={[styles.row, index > 0 && styles.rowDivider]} testID={`next-window-${window.id}`}>
            <View style={styles.rowMain}>
              <Text style={styles.windowTitle}>{window.title}</Text>
              <Text style={styles.when}>{formatWindowRange(window.startsAt, window.endsAt, timeZone)}</Text>
            </View>
            <Text style={styles.status}>{window.status}</Text>
          </View>
        ))
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', gap: space.sm, marginBottom: space.sm },
  title: { ...type.heading, color: colors.ink },
  zone: { ...type.caption, color: colors.inkMuted },
  empty: { ...type.body, color: colors.inkMuted, paddingVertical: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.md },
  rowDivider: { borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  rowMain: { flex: 1, gap: space.xxs },
  windowTitle: { ...type.bodyStrong, color: colors.ink },
  when: { ...type.caption, color: colors.inkMuted },
  status: {
    ...type.label,
    color: colors.primary,
    backgroundColor: colors.primarySoft,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
    borderRadius: radii.pill,
    overflow: 'hidden',
  },
});
