// Slices that use an element (site or span): each links to the slice, with what of it sits or runs here.
import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SliceUse } from '@/shared/inventory';
import { CriticalBadge } from '@/components/inventory/badges';
import { formatCpu, formatGbps } from '@/components/inventory/format';
import { colors, radii, space, type } from '@/constants/theme';

function summaryOf(use: SliceUse): string {
  const parts: string[] = [];
  if (use.functions.length > 0) {
    const cpu = use.functions.reduce((sum, f) => sum + f.cpu, 0);
    const names = use.functions.map((f) => f.name ?? f.id).join(', ');
    parts.push(`${names} (${formatCpu(cpu)})`);
  }
  if (use.ties.length > 0) {
    const gbps = use.ties.reduce((sum, t) => sum + t.bandwidthGbps, 0);
    parts.push(`${use.ties.length} ${use.ties.length === 1 ? 'tie' : 'ties'}, ${formatGbps(gbps)}`);
  }
  return parts.join(' · ');
}

export function SliceUseList({ uses, emptyText, testID }: { uses: readonly SliceUse[]; emptyText: string; testID: string }) {
  if (uses.length === 0) return <Text style={styles.empty} testID={`${testID}-empty`}>{emptyText}</Text>;
  return (
    <View style={styles.list} testID={testID}>
      {uses.map((use) => (
        <Link key={use.sliceId} href={{ pathname: '/slices/[id]', params: { id: use.sliceId } }} asChild>
          <Pressable role="link" testID={`${testID}-${use.sliceId}`} style={styles.row}>
            <View style={styles.line}>
              <Text style={styles.name}>{use.sliceName}</Text>
              {use.critical ? <CriticalBadge /> : null}
            </View>
            <Text style={styles.meta}>{use.tenantName}</Text>
            <Text style={styles.meta}>{summaryOf(use)}</Text>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, overflow: 'hidden' },
  row: { padding: space.md, gap: space.xxs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken, backgroundColor: colors.surface },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  name: { ...type.bodyStrong, color: colors.primary },
  meta: { ...type.caption, color: colors.inkMuted },
  empty: { ...type.body, color: colors.inkMuted },
});
