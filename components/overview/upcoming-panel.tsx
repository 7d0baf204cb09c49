// The frame both overview lists of coming work share: a heading with the viewer's zone, an empty text, and rows
// with a main column and a stage badge.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { ZoneNote } from '@/components/time/zoned-when';
import { colors, radii, space, type } from '@/constants/theme';

export function UpcomingPanel({ title, emptyText, count, testID, children }: {
  title: string; emptyText: string; count: number; testID: string; children: (timeZone: string) => ReactNode;
}) {
  const timeZone = useViewerTimeZone();
  return (
    <View style={upcomingStyles.panel} testID={testID}>
      <View style={upcomingStyles.header}>
        <Text style={upcomingStyles.title} role="heading" aria-level={2}>{title}</Text>
        <ZoneNote timeZone={timeZone} testID={`${testID}-zone`} />
      </View>
      {count === 0 ? <Text style={upcomingStyles.empty}>{emptyText}</Text> : children(timeZone)}
    </View>
  );
}

export const upcomingStyles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg },
  header: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', justifyContent: 'space-between', gap: space.sm, marginBottom: space.sm },
  title: { ...type.heading, color: colors.ink },
  empty: { ...type.body, color: colors.inkMuted, paddingVertical: space.md },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.md },
  rowDivider: { borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  rowMain: { flex: 1, gap: space.xxs },
  lead: { ...type.bodyStrong, color: colors.ink },
  when: { ...type.caption, color: colors.inkMuted },
  stage: { ...type.label, color: colors.primary, backgroundColor: colors.primarySoft, paddingHorizontal: space.sm,
    paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
});
