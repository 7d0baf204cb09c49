// One freeze: title, period in the viewer's zone with its length, reason; admins get edit and delete.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { Freeze } from '@/shared/freezes';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';
import { formatDuration, formatWindowRange } from '@/components/time';

type Props = {
  freeze: Freeze;
  timeZone: string;
  past: boolean;
  canEdit: boolean;
  deleting: boolean;
  onEdit: (id: string) => void;
  onDelete: (id: string) => void;
};

function Action({ label, onPress, testID, danger = false }: { label: string; onPress: () => void; testID: string; danger?: boolean }) {
  return (
    <Pressable role="button" testID={testID} onPress={onPress} style={({ pressed }) => [styles.action, pressed && styles.pressed]}>
      <Text style={[styles.actionText, danger && styles.danger]}>{label}</Text>
    </Pressable>
  );
}

export function FreezeRow({ freeze, timeZone, past, canEdit, deleting, onEdit, onDelete }: Props) {
  const [confirming, setConfirming] = useState(false);
  const durationMs = Date.parse(freeze.endsAt) - Date.parse(freeze.startsAt);
  return (
    <View style={[styles.row, past && styles.past]} testID={`freeze-${freeze.id}`}>
      <View style={styles.swatch} />
      <View style={styles.main}>
        <Text style={styles.title}>{freeze.title}</Text>
        <Text style={styles.when}>
          {formatWindowRange(freeze.startsAt, freeze.endsAt, timeZone)} · {formatDuration(durationMs)}
        </Text>
        {freeze.reason ? <Text style={styles.reason}>{freeze.reason}</Text> : null}
        {canEdit && !confirming ? (
          <View style={styles.actions}>
            <Action label="Edit" onPress={() => onEdit(freeze.id)} testID={`freeze-${freeze.id}-edit`} />
            <Action label="Delete" danger onPress={() => setConfirming(true)} testID={`freeze-${freeze.id}-delete`} />
          </View>
        ) : null}
        {canEdit && confirming ? (
          <View style={styles.actions}>
            <Text style={styles.confirm}>{deleting ? 'Deleting…' : 'Delete this freeze? Windows may then be booked in it.'}</Text>
            <Action label="Keep" onPress={() => setConfirming(false)} testID={`freeze-${freeze.id}-keep`} />
            <Action label="Delete" danger onPress={() => onDelete(freeze.id)} testID={`freeze-${freeze.id}-confirm-delete`} />
          </View>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.md, paddingVertical: space.md },
  past: { opacity: 0.6 },
  swatch: { width: 5, borderRadius: radii.sm, backgroundColor: calendarColors.freezeHatch },
  main: { flex: 1, gap: space.xs },
  title: { ...type.bodyStrong, color: colors.ink },
  when: { ...type.body, fontSize: 14, color: colors.ink },
  reason: { ...type.caption, color: colors.inkMuted },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm, marginTop: space.xs },
  action: { paddingHorizontal: space.md, paddingVertical: space.xs, borderRadius: radii.pill, borderWidth: 1, borderColor: colors.border },
  pressed: { backgroundColor: colors.primarySoft },
  actionText: { ...type.label, color: colors.primary },
  danger: { color: colors.danger },
  confirm: { ...type.caption, color: colors.danger, flexBasis: '100%' },
});
