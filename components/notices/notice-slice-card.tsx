// One of the tenant's slices in a notice: what moves where, and the effect to expect.
import { StyleSheet, Text, View } from 'react-native';
import type { NoticeSlice } from '@/shared/notices';
import { Badge, CriticalBadge } from '@/components/inventory/badges';
import { colors, radii, space, type } from '@/constants/theme';
import { EFFECT_LABEL } from './notice-format';

export function NoticeSliceCard({ slice }: { slice: NoticeSlice }) {
  return (
    <View style={styles.card} testID={`notice-slice-${slice.slice}`}>
      <View style={styles.head}>
        <Text style={styles.name}>{slice.name}</Text>
        {slice.critical ? <CriticalBadge /> : null}
        <Badge label={EFFECT_LABEL[slice.effect]} tone={slice.effect === 'interruption' ? 'danger' : 'primary'} />
      </View>
      {slice.changes.map((line) => (
        <View key={line} style={styles.line}>
          <Text style={styles.bullet}>•</Text>
          <Text style={styles.text}>{line}</Text>
        </View>
      ))}
      <Text style={[styles.effect, slice.effect === 'interruption' && styles.interruption]}>{slice.effectText}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.xs, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink },
  line: { flexDirection: 'row', gap: space.sm },
  bullet: { ...type.body, color: colors.inkMuted },
  text: { ...type.body, color: colors.ink, flexShrink: 1 },
  effect: { ...type.caption, color: colors.inkMuted },
  interruption: { color: colors.danger },
});
