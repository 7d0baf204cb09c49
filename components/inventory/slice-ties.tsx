// A slice's ties: bandwidth, the latency budget against the current path's latency, and the path as a site sequence.
import { StyleSheet, Text, View } from 'react-native';
import type { SliceFunctionView, SliceTieView } from '@/shared/inventory';
import { Badge } from '@/components/inventory/badges';
import { formatAvailability, formatGbps, formatMs } from '@/components/inventory/format';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { ties: readonly SliceTieView[]; functions: readonly SliceFunctionView[]; siteName: (id: string) => string };

function LatencyLine({ tie }: { tie: SliceTieView }) {
  if (!tie.path) return <Text style={styles.muted}>{`budget ${formatMs(tie.maxLatencyMs)} · no current path`}</Text>;
  const over = tie.path.latencyMs > tie.maxLatencyMs;
  return (
    <View style={styles.line}>
      <Text style={[styles.figure, over && styles.over]}>{`${formatMs(tie.path.latencyMs)} of ${formatMs(tie.maxLatencyMs)} budget`}</Text>
      {over ? <Badge label="Over budget" tone="danger" testID={`tie-over-${tie.id}`} /> : null}
    </View>
  );
}

function AvailabilityLine({ tie }: { tie: SliceTieView }) {
  if (!tie.path || tie.minAvailability === null) return null;
  const short = tie.path.availability < tie.minAvailability;
  return (
    <Text style={[styles.muted, short && styles.over]}>
      {`path availability ${formatAvailability(tie.path.availability)} (needs ${formatAvailability(tie.minAvailability)})`}
    </Text>
  );
}

export function SliceTies({ ties, functions, siteName }: Props) {
  if (ties.length === 0) return <Text style={styles.muted}>This slice has a single function and no ties.</Text>;
  const fnName = (id: string) => functions.find((f) => f.id === id)?.name ?? id;
  return (
    <View style={styles.list} testID="slice-ties">
      {ties.map((tie) => (
        <View key={tie.id} style={styles.row} testID={`slice-tie-${tie.id}`}>
          <View style={styles.line}>
            <Text style={styles.name}>{`${fnName(tie.from)} → ${fnName(tie.to)}`}</Text>
            <Text style={styles.figure}>{formatGbps(tie.bandwidthGbps)}</Text>
          </View>
          <LatencyLine tie={tie} />
          <AvailabilityLine tie={tie} />
          {tie.path ? (
            <Text style={styles.path} testID={`slice-tie-path-${tie.id}`}>
              {tie.path.sites.length > 1 ? tie.path.sites.map(siteName).join(' › ') : `both ends on ${siteName(tie.path.sites[0] ?? '')}`}
            </Text>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: space.md, gap: space.xxs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap', justifyContent: 'space-between' },
  name: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  figure: { ...type.label, color: colors.ink },
  over: { color: colors.danger },
  path: { ...type.caption, color: colors.primary },
  muted: { ...type.caption, color: colors.inkMuted },
});
