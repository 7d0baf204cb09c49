// The calendar part of a message, readable: what it asks (method), the event's summary, times, sequence and
// status, then the .ics text exactly as sent.
import { Platform, ScrollView, StyleSheet, Text, View } from 'react-native';
import type { OutboxCalendar } from '@/shared/outbox';
import { Badge } from '@/components/inventory/badges';
import { Facts, Note } from '@/components/inventory/detail-frame';
import { colors, radii, space, type } from '@/constants/theme';
import { eventTimeWords, methodWords } from './outbox-format';

// The theme has no code face; the platform's own monospace keeps columns of the .ics aligned.
const MONOSPACE = Platform.select({ ios: 'Menlo', default: 'monospace' });

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
      <Text style={styles.label}>The .ics as sent</Text>
      <ScrollView horizontal style={styles.codeBox} contentContainerStyle={styles.codeContent}>
        <Text style={styles.code} selectable testID="outbox-ics">
          {calendar.text.replace(/\r\n/g, '\n').trimEnd()}
        </Text>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  method: { ...type.bodyStrong, color: colors.primary },
  summary: { ...type.heading, color: colors.ink },
  uid: { ...type.caption, color: colors.inkMuted },
  label: { ...type.label, color: colors.inkMuted, marginTop: space.xs },
  codeBox: { backgroundColor: colors.surfaceSunken, borderRadius: radii.md },
  codeContent: { padding: space.md },
  code: { fontFamily: MONOSPACE, fontSize: 12, lineHeight: 18, color: colors.ink },
});
