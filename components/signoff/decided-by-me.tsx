// "Decided by me" under the sign-off queue: the windows this approver already decided, with the decision, when
// (viewer's zone) and where the window stands now; each opens the window's sign-off screen.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { DecidedByMeItem } from '@/shared/signoff-mine';
import type { WindowStatus } from '@/shared/windows';
import { formatInstant } from '@/components/time';
import { StatusBadge } from '@/components/windows/status-badge';
import { DECISION_WORDS } from '@/components/signoff/signoff-words';
import { colors, radii, space, type } from '@/constants/theme';
import { linkKeyProps } from '@/components/key-props';

type Props = { items: DecidedByMeItem[]; timeZone: string; onOpen: (windowId: string) => void };

function roundNote(item: DecidedByMeItem): string {
  return item.round === item.currentRound ? `Review round ${item.round}` : `Earlier review round ${item.round} (now round ${item.currentRound})`;
}

function DecidedRow({ item, timeZone, onOpen }: { item: DecidedByMeItem; timeZone: string; onOpen: (id: string) => void }) {
  const decided = `${DECISION_WORDS[item.decision]} ${formatInstant(item.decidedAt, timeZone)}`;
  return (
    <Pressable
      role="link" onPress={() => onOpen(item.windowId)} {...linkKeyProps(() => onOpen(item.windowId))}
      testID={`signoff-decided-${item.windowId}-${item.round}`} style={({ pressed }) => [styles.row, pressed && styles.pressed]}
    >
      <View style={styles.top}>
        <Text style={styles.title}>{item.title}</Text>
        <StatusBadge status={item.windowStatus as WindowStatus} />
      </View>
      <Text style={[styles.decision, { color: item.decision === 'approve' ? colors.primary : colors.danger }]}>{decided}</Text>
      <Text style={styles.meta}>{roundNote(item)}{item.codeConfirmed ? ' · confirmed with a code' : ''}</Text>
      {item.comment ? <Text style={styles.body} numberOfLines={2}>“{item.comment}”</Text> : null}
    </Pressable>
  );
}

export function DecidedByMe({ items, timeZone, onOpen }: Props) {
  return (
    <View style={styles.section} testID="signoff-decided-by-me">
      <Text style={styles.heading} role="heading" aria-level={2}>Decided by me</Text>
      {items.length === 0
        ? <Text style={styles.meta}>You have not decided on any window yet.</Text>
        : (
          <View role="list" aria-label="Windows I decided on" style={styles.list}>
            {items.map((item) => (
              <View role="listitem" key={`${item.windowId}-${item.round}`}>
                <DecidedRow item={item} timeZone={timeZone} onOpen={onOpen} />
              </View>
            ))}
          </View>
        )}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm, marginTop: space.lg },
  heading: { ...type.heading, color: colors.abyss },
  list: { gap: space.sm },
  row: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.md, gap: space.xxs },
  pressed: { backgroundColor: colors.primarySoft },
  top: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.sm },
  title: { ...type.bodyStrong, color: colors.ink, flexShrink: 1 },
  decision: { ...type.label },
  body: { ...type.body, color: colors.ink },
  meta: { ...type.caption, color: colors.inkMuted },
});
