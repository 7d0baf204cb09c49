// The approver's queue: windows in review, soonest first, each with its risk, approvals so far and my state; below
// it the footer (what I decided already, the way to codes and policy), which stays in reach when the queue is empty.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { SignoffQueueItem } from '@/shared/signoff';
import { PageColumn } from '@/components/page-column';
import { describeZone, formatWindowRange } from '@/components/time';
import { RiskPill } from '@/components/signoff/risk-pill';
import { quorumSentence } from '@/components/signoff/signoff-words';
import { colors, radii, space, type } from '@/constants/theme';
import { linkKeyProps } from '@/components/key-props';

type Props = { items: SignoffQueueItem[]; timeZone: string; onOpen: (windowId: string) => void; footer?: ReactNode };

function myLine(item: SignoffQueueItem): string {
  if (item.me.decided) return 'You have decided';
  if (item.me.blocked === 'self') return 'Your own work: another approver decides';
  return 'Waiting for your decision';
}

function QueueRow({ item, timeZone, onOpen }: { item: SignoffQueueItem; timeZone: string; onOpen: (id: string) => void }) {
  const waiting = !item.me.decided && item.me.blocked === null;
  return (
    <Pressable
      role="link"
      testID={`signoff-queue-item-${item.windowId}`} onPress={() => onOpen(item.windowId)} {...linkKeyProps(() => onOpen(item.windowId))}
      style={({ pressed }) => [styles.row, pressed && styles.pressed]}
    >
      <View style={styles.top}>
        <Text style={styles.title}>{item.title}</Text>
        <RiskPill risk={item.riskClass} />
      </View>
      <Text style={styles.body}>{formatWindowRange(item.startsAt, item.endsAt, timeZone)}</Text>
      <Text style={styles.meta}>
        {quorumSentence(item.approvals, item.quorum)}{item.critical ? ' · critical service' : ''}{item.workType ? ` · ${item.workType}` : ''}
      </Text>
      <Text style={[styles.meta, waiting && styles.waiting]}>{myLine(item)}</Text>
    </Pressable>
  );
}

export function SignoffQueueList({ items, timeZone, onOpen, footer }: Props) {
  return (
    <PageColumn narrow>
      <Text style={styles.heading} role="heading" aria-level={1}>Sign-off</Text>
      <Text style={styles.meta}>{items.length} window{items.length === 1 ? '' : 's'} in review · times in {describeZone(timeZone)}</Text>
      {items.length === 0 ? (
        <View style={styles.empty} testID="signoff-queue-empty">
          <Text style={styles.emptyTitle}>Nothing to sign off</Text>
          <Text style={styles.body}>Windows appear here when a planner submits an accepted plan.</Text>
        </View>
      ) : (
        // A list of links, each named by what it shows (title, times, approvals, my part), in that order.
        <View role="list" aria-label="Windows in review" style={styles.list} testID="signoff-queue-list">
          {items.map((item) => (
            <View role="listitem" key={item.windowId}>
              <QueueRow item={item} timeZone={timeZone} onOpen={onOpen} />
            </View>
          ))}
        </View>
      )}
      {footer}
    </PageColumn>
  );
}

const styles = StyleSheet.create({
  heading: { ...type.title, color: colors.abyss },
  list: { gap: space.md },
  row: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg, gap: space.xs },
  pressed: { backgroundColor: colors.primarySoft },
  top: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.sm },
  title: { ...type.heading, color: colors.ink, flexShrink: 1 },
  body: { ...type.body, color: colors.ink },
  meta: { ...type.caption, color: colors.inkMuted },
  waiting: { ...type.label, color: colors.primary },
  empty: { alignItems: 'center', gap: space.xs, paddingVertical: space.xl },
  emptyTitle: { ...type.heading, color: colors.ink },
});
