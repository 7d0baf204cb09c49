// Other windows this one collides with, each with the reasons in words and a way to open it.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { WindowConflict } from '@/shared/window-impact';
import { formatWindowRange } from '@/components/time';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';
import { linkKeyProps } from '@/components/key-props';

const REASON_LABELS: Record<WindowConflict['reasons'][number]['reason'], string> = {
  'shared-element': 'Shares equipment',
  'joint-split': 'Together they split the network',
  'strands-slice': 'Together they strand a slice',
};

type Props = { conflicts: readonly WindowConflict[]; timeZone: string; onOpenWindow: (id: string) => void };

export function ConflictsList({ conflicts, timeZone, onOpenWindow }: Props) {
  if (conflicts.length === 0) return <Text style={styles.muted} testID="window-no-conflicts">No other window collides with this one.</Text>;
  return (
    <View style={styles.list} testID="window-conflicts">
      {conflicts.map((c) => (
        <Pressable
          key={c.window.id}
          role="link"
          onPress={() => onOpenWindow(c.window.id)}
          {...linkKeyProps(() => onOpenWindow(c.window.id))}
          style={({ pressed }) => [styles.item, pressed && styles.pressed]}
          testID={`window-conflict-${c.window.id}`}
        >
          <Text style={styles.title}>{c.window.title}</Text>
          <Text style={styles.muted}>{formatWindowRange(c.window.startsAt, c.window.endsAt, timeZone)}</Text>
          {c.reasons.map((r) => (
            <View key={r.reason} style={styles.reason}>
              <Text style={styles.reasonLabel}>{REASON_LABELS[r.reason]}</Text>
              <Text style={styles.body}>{r.message}</Text>
            </View>
          ))}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { gap: space.xs, padding: space.md, borderRadius: radii.md, borderLeftWidth: 4, borderLeftColor: calendarColors.conflict, backgroundColor: calendarColors.conflictSoft },
  pressed: { opacity: 0.8 },
  title: { ...type.bodyStrong, color: colors.primary, textDecorationLine: 'underline' },
  reason: { gap: space.xxs },
  reasonLabel: { ...type.label, color: calendarColors.conflict },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
