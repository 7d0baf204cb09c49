// Freezes, current and coming first, then past ones faded.
import { StyleSheet, Text, View } from 'react-native';
import type { Freeze } from '@/shared/freezes';
import { colors, radii, space, type } from '@/constants/theme';
import { FreezeRow } from './freeze-row';

type Props = {
  freezes: readonly Freeze[];
  timeZone: string;
  nowMs: number;
  canEdit: boolean;
  deletingId?: string;
  onEdit: (id: string) => void;
  onDelete: (id: string) => void;
};

/** Coming and current freezes (soonest first), then past ones (latest first). */
export function splitFreezes(freezes: readonly Freeze[], nowMs: number): { coming: Freeze[]; past: Freeze[] } {
  const byStart = [...freezes].sort((a, b) => Date.parse(a.startsAt) - Date.parse(b.startsAt));
  return {
    coming: byStart.filter((f) => Date.parse(f.endsAt) > nowMs),
    past: byStart.filter((f) => Date.parse(f.endsAt) <= nowMs).reverse(),
  };
}

export function FreezeList({ freezes, timeZone, nowMs, canEdit, deletingId, onEdit, onDelete }: Props) {
  const { coming, past } = splitFreezes(freezes, nowMs);
  const section = (title: string, items: Freeze[], isPast: boolean) =>
    items.length === 0 ? null : (
      <View style={styles.section}>
        <Text style={styles.sectionTitle}>{title}</Text>
        {items.map((freeze, index) => (
          <View key={freeze.id} style={index > 0 && styles.divider}>
            <FreezeRow
              freeze={freeze}
              timeZone={timeZone}
              past={isPast}
              canEdit={canEdit}
              deleting={deletingId === freeze.id}
              onEdit={onEdit}
              onDelete={onDelete}
            />
          </View>
        ))}
      </View>
    );
  return (
    <View style={styles.panel} testID="freeze-list">
      {section('Current and coming', coming, false)}
      {coming.length === 0 ? <Text style={styles.none}>No freeze ahead: windows may be booked on any day.</Text> : null}
      {section('Past', past, true)}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg, gap: space.lg },
  section: { gap: space.xxs },
  sectionTitle: { ...type.label, color: colors.inkMuted, textTransform: 'uppercase' },
  divider: { borderTopWidth: 1, borderTopColor: colors.surfaceSunken },
  none: { ...type.body, color: colors.inkMuted },
});
