// Past imports, newest first: file, kind, state, counts, who and when; pressing one shows its preview again.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { ImportSummary } from '@/shared/imports';
import { formatWhen } from '@/components/inventory/format';
import { KIND_LABELS } from './import-kinds';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { imports: readonly ImportSummary[]; selectedId: string | null; onOpen: (id: string) => void };

function summaryLine(item: ImportSummary): string {
  const { adds, changes, removes, errors } = item.counts;
  if (errors > 0) return `${errors} ${errors === 1 ? 'error' : 'errors'}`;
  return `+${adds} ~${changes} −${removes}`;
}

export function ImportHistory({ imports, selectedId, onOpen }: Props) {
  if (imports.length === 0) return <Text style={styles.muted} testID="import-history-empty">No imports yet.</Text>;
  return (
    <View style={styles.list} testID="import-history">
      {imports.map((item) => (
        <Pressable
          key={item.id}
          role="button"
          testID={`import-history-${item.id}`}
          onPress={() => onOpen(item.id)}
          style={[styles.row, item.id === selectedId && styles.selected]}
        >
          <View style={styles.line}>
            <Text style={styles.name} numberOfLines={1}>{item.fileName}</Text>
            <Text style={[styles.status, item.status === 'applied' && styles.appliedStatus]}>{item.status}</Text>
          </View>
          <Text style={styles.muted}>{`${KIND_LABELS[item.kind]} · ${summaryLine(item)}`}</Text>
          <Text style={styles.muted}>{formatWhen(item.appliedAt ?? item.createdAt)}</Text>
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { borderWidth: 1, borderColor: colors.border, borderRadius: radii.lg, overflow: 'hidden', backgroundColor: colors.surface },
  row: { padding: space.md, gap: space.xxs, borderBottomWidth: 1, borderBottomColor: colors.surfaceSunken, borderLeftWidth: 3, borderLeftColor: 'transparent' },
  selected: { backgroundColor: colors.primarySoft, borderLeftColor: colors.buoyDeep },
  line: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  name: { ...type.bodyStrong, color: colors.ink, flex: 1 },
  status: { ...type.label, color: colors.inkMuted },
  appliedStatus: { color: colors.primary },
  muted: { ...type.caption, color: colors.inkMuted },
});
