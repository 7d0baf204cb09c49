// A tenant user's coming work on its slices, in its notices' words; each row opens the notice.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { TenantWindowView } from '@/shared/tenant-windows';
import { formatWindowRange, viewerTimeZone } from '@/components/overview/time-format';
import { colors, radii, space, type } from '@/constants/theme';

export function NextWork({ work, onOpenNotice }: { work: readonly TenantWindowView[]; onOpenNotice: (noticeId: string) => void }) {
  const timeZone = viewerTimeZone();
  return (
    <View style={styles.panel} testID="overview-next-work">
      <View style={styles.header}>
        <Text style={styles.title} role="heading">Planned work on your slices</Text>
        <Text style={styles.zone}>Times in {timeZone}</Text>
      </View>
      {work.length === 0 ? (
        <Text style={styles.empty}>No planned work on your slices has been announced.</Text>
      ) : (
        work.map((item, index) => (
          <Pressable key={item.windowId} role="link" testID={`next-work-${item.windowId}`}
            accessibilityLabel={`${item.summary}, open the notice`}
            onPress={() => onOpenNotice(item.noticeId)} style={[styles.row, index > 0 && styles.rowDivider]}>
            <View style={styles.rowMain}>
              <Text style={styles.summary}>{item.summary}</Text>
              <Text style={styles.when}>{formatWindowRange(item.startsAt, item.endsAt, timeZone)}</Text>
              <Text style={styles.when}>{item.effectText}</Text>
            </View>
            <Text style={styles.stage}>{item.stage}</Text>
          </Pressable>
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
  summary: { ...type.bodyStrong, color: colors.ink },
  when: { ...type.caption, color: colors.inkMuted },
  stage: { ...type.label, color: colors.primary, backgroundColor: colors.primarySoft, paddingHorizontal: space.sm,
    paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
});
