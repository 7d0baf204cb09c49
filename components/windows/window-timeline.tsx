// A window's history as a dated timeline: what happened, when (in the viewer's zone), by whom, and any comment.
import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { canReadAuditTrail, isOperator } from '@/shared/permissions';
import type { WindowEvent } from '@/shared/window-history';
import { useWindowHistoryQuery } from '@/hooks/queries/window-history';
import { formatInstant } from '@/components/time';
import { STATUS_LABELS } from '@/components/windows/lifecycle';
import { Section } from '@/components/windows/section';
import { colors, space, type } from '@/constants/theme';

const round = (e: WindowEvent) => (e.round && e.round > 1 ? ` (round ${e.round})` : '');

/** One sentence per event, in our own words. */
export function eventSentence(e: WindowEvent): string {
  switch (e.kind) {
    case 'booked': return 'Booked the window';
    case 'edited': return e.reverted ? 'Changed the window; its impact and plan no longer hold, so it went back to draft' : 'Changed the window';
    case 'assessed': return 'Worked out the impact on slices';
    case 'mop-attached': return 'Attached the method of procedure';
    case 'run-started': return 'Started a run of the re-mapper';
    case 'run-cancelled': return 'Cancelled a run of the re-mapper';
    case 'run-failed': return 'A run of the re-mapper failed';
    case 'plan-accepted': return 'Accepted a move plan';
    case 'submitted': return `Submitted the plan for sign-off${round(e)}`;
    case 'approved': return `Approved the plan${round(e)}`;
    case 'sent-back': return `Sent the plan back${round(e)}`;
    case 'cleared': return `The change board signed the plan off${round(e)}`;
    case 'notified': return 'Sent the notices to the affected tenants';
    case 'moved': return e.status ? `Marked the window ${STATUS_LABELS[e.status].toLowerCase()}` : 'Moved the window on';
  }
}

function Row({ event, timeZone }: { event: WindowEvent; timeZone: string }) {
  return (
    <View style={styles.row} testID="window-timeline-row">
      <Text style={styles.when}>{formatInstant(event.at, timeZone)}</Text>
      <Text style={styles.what}>{eventSentence(event)}</Text>
      <Text style={styles.who}>{event.by ? `by ${event.by}` : 'by the system or someone no longer listed'}</Text>
      {event.comment ? <Text style={styles.comment}>“{event.comment}”</Text> : null}
    </View>
  );
}

export function WindowTimeline({ windowId, me, timeZone }: { windowId: string; me: Me; timeZone: string }) {
  const staff = isOperator(me.roles);
  const history = useWindowHistoryQuery(windowId, staff);
  if (!staff) return null;
  let body;
  if (history.isError) body = <Text style={styles.error}>Could not load the history: {history.error.message}</Text>;
  else if (!history.data) body = <Text style={styles.muted}>Loading the history…</Text>;
  else if (history.data.events.length === 0) body = <Text style={styles.muted}>Nothing recorded yet.</Text>;
  // Newest first: the latest step is what a person coming back wants to see.
  else body = [...history.data.events].reverse().map((e) => <Row key={e.id} event={e} timeZone={timeZone} />);
  return (
    <Section title="History" testID="window-timeline">
      <Text style={styles.muted}>Newest first · times in {timeZone}</Text>
      {body}
      {canReadAuditTrail(me.roles) ? (
        <Link href={{ pathname: '/audit', params: { window: windowId } }} style={styles.link} testID="window-open-audit">
          Every recorded action on this window, in the audit trail
        </Link>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xxs, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.border },
  when: { ...type.caption, color: colors.inkMuted },
  what: { ...type.bodyStrong, color: colors.ink },
  who: { ...type.body, color: colors.ink },
  comment: { ...type.body, color: colors.ink, fontStyle: 'italic' },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
  link: { ...type.bodyStrong, color: colors.primary, textDecorationLine: 'underline', paddingTop: space.sm },
});
