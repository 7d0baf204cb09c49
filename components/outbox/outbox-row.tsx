// One message in the Outbox list: subject, recipients, when it arrived, size, and whether it invites.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { OutboxSummary } from '@/shared/outbox';
import { Badge } from '@/components/inventory/badges';
import { formatInstant } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';
import { formatSizeBytes, recipientsLine } from './outbox-format';

type Props = { message: OutboxSummary; selected: boolean; viewerZone: string; onOpen: (id: number) => void };

export function OutboxRow({ message, selected, viewerZone, onOpen }: Props) {
  return (
    <Pressable
      role="link"
      testID={`outbox-row-${message.id}`}
      aria-current={selected ? 'true' : undefined}
      onPress={() => onOpen(message.id)}
      style={({ pressed }) => [styles.row, selected && styles.selected, pressed && styles.pressed]}
    >
      <View style={styles.top}>
        <Text style={styles.subject} numberOfLines={1}>
          {message.subject ?? '(no subject)'}
        </Text>
        {message.hasCalendar ? (
          <View style={styles.badge}>
            <Badge label="Invitation" tone="primary" />
          </View>
        ) : null}
      </View>
      <Text style={styles.meta} numberOfLines={1}>{`To ${recipientsLine(message.to)}`}</Text>
      <Text style={styles.meta}>{`${formatInstant(message.receivedAt, viewerZone)} · ${formatSizeBytes(message.sizeBytes)}`}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    gap: space.xxs,
    paddingVertical: space.sm,
    paddingHorizontal: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
    minHeight: 44,
  },
  // A bar on the leading edge as well as the tint: the open message differs by shape too, not by colour alone.
  selected: { borderColor: colors.primary, backgroundColor: colors.primarySoft, borderLeftWidth: 6 },
  pressed: { backgroundColor: colors.surfaceSunken },
  top: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  subject: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  badge: { flexShrink: 0 },
  meta: { ...type.caption, color: colors.inkMuted },
});
