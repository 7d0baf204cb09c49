// Whole-network effects of a window: whether it splits the network, and spans that would run over capacity.
import { StyleSheet, Text, View } from 'react-native';
import type { WindowImpact } from '@/shared/window-impact';
import { colors, radii, space, type } from '@/constants/theme';

export function SplitsBanner({ impact }: { impact: Pick<WindowImpact, 'splits' | 'components'> }) {
  if (!impact.splits) return null;
  return (
    <View style={styles.banner} role="alert" testID="impact-splits">
      <Text style={styles.bannerTitle}>The network splits during this window</Text>
      <Text style={styles.body}>
        Without the equipment taken out, the network falls into {impact.components} separate parts. Slices with ends in
        different parts cannot be kept running by rerouting alone.
      </Text>
    </View>
  );
}

export function OverloadedSpans({ overloaded }: { overloaded: WindowImpact['overloaded'] }) {
  if (overloaded.length === 0) {
    return <Text style={styles.muted} testID="impact-no-overload">No span would run over capacity if traffic simply took the shortest way round.</Text>;
  }
  return (
    <View style={styles.list} testID="impact-overloaded">
      <Text style={styles.muted}>If cut traffic simply took the shortest way round, these spans would run over capacity:</Text>
      {overloaded.map((o) => (
        <View key={o.span} style={styles.row}>
          <Text style={styles.id}>{o.span}</Text>
          <Text style={styles.figure}>
            {o.loadGbps.toFixed(1)} of {o.capacityGbps} Gbit/s ({Math.round((o.loadGbps / o.capacityGbps) * 100)} %)
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.dangerSoft, borderLeftWidth: 4, borderLeftColor: colors.danger },
  bannerTitle: { ...type.heading, color: colors.danger },
  body: { ...type.body, color: colors.ink },
  list: { gap: space.xs },
  row: { flexDirection: 'row', justifyContent: 'space-between', gap: space.sm, paddingVertical: space.xs },
  id: { ...type.bodyStrong, color: colors.ink },
  figure: { ...type.body, color: colors.danger },
  muted: { ...type.caption, color: colors.inkMuted },
});
