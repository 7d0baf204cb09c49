// The calendar part of a message, readable: what it asks (method), the event's summary, times, sequence and
// status. The .ics text itself is in the folded raw message (outbox-raw.tsx).
import { StyleSheet, Text, View } from 'react-native';
import type { OutboxCalendar } from '@/shared/outbox';
import { Badge } from '@/components/inventory/badges';
import { Facts, Note } from '@/components/inventory/detail-frame';
import { colors, space, type } from '@/constants/theme';
import { eventTimeWords, methodWords } from './outbox-format';

export function OutboxInvitation({ calendar, viewerZone }: { calendar: OutboxCalendar; viewerZone: string }) {
  const event = calendar.event;
  const cancelled = calendar.method?.toUpperCase() === 'CANCEL' || event?.status?.toUpperCase() === 'CANCELLED';
  return (
    <View style={styles.box} testID="outbox-invitation">
      <View style={styles.head}>
        <Text style={styles.method} testID="outbox-invitation-method">{methodWords(calendar.method)}</Text>
        {cancelled ? <Badge label="Cancelled" tone="danger" /> : null}
      </View>
      {event ? (
        <>
          <Text style={styles.summary}>{event.summary ?? '(no summary)'}</Text>
          <Facts
            items={[
              { label: 'Starts', value: eventTimeWords(event.start, viewerZone) },
              { label: 'Ends', value: eventTimeWords(event.end, viewerZone) },
              { label: 'Sequence', value: event.sequence === null ? '—' : String(event.sequence) },
              { label: 'Status', value: event.status ?? '—' },
              ...(event.location ? [{ label: 'Location', value: event.location }] : []),
              ...(event.organizer ? [{ label: 'Organiser', value: event.organizer }] : []),
            ]}
          />
          <Text style={styles.uid} selectable>{`UID ${event.uid ?? '—'}`}</Text>
        </>
      ) : (
        <Note>The calendar holds no event.</Note>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  method: { ...type.bodyStrong, color: colors.primary },
  summary: { ...type.heading, color: colors.ink },
  uid: { ...type.caption, color: colors.inkMuted },
});
