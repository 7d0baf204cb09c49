// A slice's functions: where each runs now, its compute, what holds it in place (anchor, fixed) and its move cost.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SliceFunctionView } from '@/shared/inventory';
import { Badge } from '@/components/inventory/badges';
import { formatCpu, formatKm } from '@/components/inventory/format';
import { colors, radii, space, type } from '@/constants/theme';

function anchorText(fn: SliceFunctionView, siteName: (id: string) => string): string | null {
  if (!fn.anchor) return null;
  if ('site' in fn.anchor) return `anchored to ${siteName(fn.anchor.site)}`;
  const { lat, lon, radiusKm } = fn.anchor;
  return `within ${formatKm(radiusKm)} of ${lat.toFixed(3)}, ${lon.toFixed(3)}`;
}

type Props = { functions: readonly SliceFunctionView[]; siteName: (id: string) => string };

export function SliceFunctions({ functions, siteName }: Props) {
  return (
    <View style={styles.list} testID="slice-functions">
      {functions.map((fn) => {
        const anchor = anchorText(fn, siteName);
        return (
          <View key={fn.id} style={styles.row} testID={`slice-function-${fn.id}`}>
            <View style={styles.head}>
              <Text style={styles.name}>{fn.name ?? fn.id}</Text>
              {fn.fixed ? <Badge label="Fixed" tone="primary" /> : null}
              <Text style={styles.cpu}>{formatCpu(fn.cpu)}</Text>
            </View>
            {fn.siteId ? (
              <Link href={{ pathname: '/network/sites/[id]', params: { id: fn.siteId } }} asChild>
                <Pressable role="link">
                  <Text style={styles.link}>{`on ${fn.siteName ?? fn.siteId}`}</Text>
                </Pressable>
              </Link>
            ) : (
              <Text style={styles.muted}>not placed</Text>
            )}
            <Text style={styles.muted}>{[fn.name ? fn.id : null, anchor, `move cost ${fn.moveCost}`].filter(Boolean).join(' · ')}</Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: space.md, gap: space.xxs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  name: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  cpu: { ...type.label, color: colors.ink, marginLeft: 'auto' },
  link: { ...type.body, color: colors.primary },
  muted: { ...type.caption, color: colors.inkMuted },
});
