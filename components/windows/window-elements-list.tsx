// The sites and spans a window takes out, and how (down, or reduced to a share of capacity); by name, never by id.
import { StyleSheet, Text, View } from 'react-native';
import type { Window } from '@/shared/windows';
import { ElementSummary } from '@/components/windows/element-name';
import { colors, radii, space, type } from '@/constants/theme';

export function effectText(e: { effect: 'down' | 'reduced'; fraction: number | null }): string {
  if (e.effect === 'down') return 'Down';
  return e.fraction === null ? 'Reduced' : `Reduced to ${Math.round(e.fraction * 100)} %`;
}

export function WindowElementsList({ elements }: { elements: Window['elements'] }) {
  if (elements.length === 0) return <Text style={styles.muted}>No sites or spans listed.</Text>;
  return (
    <View style={styles.list} testID="window-elements">
      {elements.map((e) => (
        <View key={`${e.kind}:${e.id}`} style={styles.row}>
          <View style={styles.names}>
            <ElementSummary kind={e.kind} id={e.id} style={styles.name} detailStyle={styles.muted} testID={`window-element-${e.id}`} />
          </View>
          <Text style={[styles.effect, e.effect === 'down' ? styles.down : styles.reduced]}>{effectText(e)}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.xs },
  names: { flex: 1 },
  name: { ...type.bodyStrong, color: colors.ink },
  effect: { ...type.label, paddingHorizontal: space.sm, paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
  down: { color: colors.danger, backgroundColor: colors.dangerSoft },
  reduced: { color: colors.warning, backgroundColor: colors.surfaceSunken },
  muted: { ...type.caption, color: colors.inkMuted },
});
