// "What uses it": the slices on a site or span, each with its tenant, what it puts there, and a caution mark when critical.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { linkKeyProps } from '@/components/key-props';
import type { SliceUse } from '@/shared/inventory';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { title: string; uses: readonly SliceUse[]; emptyText: string; onOpenSlice?: (sliceId: string) => void };

function summaryOfUse(use: SliceUse): string {
  const parts: string[] = [];
  if (use.functions.length > 0) {
    const cpu = use.functions.reduce((sum, f) => sum + f.cpu, 0);
    parts.push(`${use.functions.length} function${use.functions.length === 1 ? '' : 's'}, ${cpu} vCPU`);
  }
  if (use.ties.length > 0) {
    const gbps = use.ties.reduce((sum, t) => sum + t.bandwidthGbps, 0);
    parts.push(`${use.ties.length} tie${use.ties.length === 1 ? '' : 's'}, ${Number(gbps.toFixed(2))} Gbit/s`);
  }
  return parts.join(' · ');
}

export function MapSliceUses({ title, uses, emptyText, onOpenSlice }: Props) {
  return (
    <View style={styles.group}>
      <Text style={styles.title}>
        {title} <Text style={styles.count}>({uses.length})</Text>
      </Text>
      {uses.length === 0 ? <Text style={styles.muted}>{emptyText}</Text> : null}
      {uses.map((use) => (
        <Pressable
          key={use.sliceId}
          testID={`map-use-${use.sliceId}`}
          disabled={!onOpenSlice}
          onPress={() => onOpenSlice?.(use.sliceId)}
          role={onOpenSlice ? 'link' : undefined}
          {...(onOpenSlice ? linkKeyProps(() => onOpenSlice(use.sliceId)) : {})}
          style={({ pressed }) => [styles.row, pressed && styles.pressed]}
        >
          <View style={styles.rowHead}>
            <Text style={styles.name} numberOfLines={1}>{use.sliceName}</Text>
            {use.critical ? <Text style={styles.critical}>critical</Text> : null}
          </View>
          <Text style={styles.muted} numberOfLines={1}>{use.tenantName}</Text>
          <Text style={styles.muted}>{summaryOfUse(use)}</Text>
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.xs },
  title: { ...type.label, color: colors.inkMuted, textTransform: 'uppercase' },
  count: { ...type.label, color: colors.inkFaint },
  row: { paddingVertical: space.sm, paddingHorizontal: space.sm, borderRadius: radii.sm, minHeight: 44, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken },
  pressed: { backgroundColor: colors.primarySoft },
  rowHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  critical: { ...type.caption, color: colors.danger, backgroundColor: colors.dangerSoft, paddingHorizontal: space.xs, borderRadius: radii.sm },
  muted: { ...type.caption, color: colors.inkMuted },
});
