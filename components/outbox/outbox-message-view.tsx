// One received message, readable first: headers, the text body, the invitation's event (when there is one),
// attachments; the raw source (iCalendar text, .eml download) folded away at the end.
import { StyleSheet, Text, View } from 'react-native';
import type { OutboxMessage } from '@/shared/outbox';
import { DetailFrame, Note, Section } from '@/components/inventory/detail-frame';
import { formatInstant } from '@/components/time';
import { useViewerTimeZone } from '@/components/time/use-viewer-time-zone';
import { colors, radii, space, type } from '@/constants/theme';
import { formatSizeBytes } from './outbox-format';
import { OutboxHeaders } from './outbox-headers';
import { OutboxInvitation } from './outbox-invitation';
import { OutboxRaw } from './outbox-raw';

export function OutboxMessageView({ message }: { message: OutboxMessage }) {
  const zone = useViewerTimeZone();
  return (
    <DetailFrame
      kicker={`Message · ${formatSizeBytes(message.sizeBytes)}`}
      title={message.subject ?? '(no subject)'}
      backHref="/outbox"
      backLabel="Outbox"
      testID="outbox-message"
    >
      <OutboxHeaders
        rows={[
          { label: 'From', value: message.from ?? message.envelope.from ?? '—' },
          { label: 'To', value: message.to ?? message.envelope.to.join(', ') },
          ...(message.cc ? [{ label: 'Cc', value: message.cc }] : []),
          { label: 'Sent', value: message.date ? formatInstant(message.date, zone) : '—' },
          { label: 'Received', value: formatInstant(message.receivedAt, zone) },
        ]}
      />
      <Section title="Text">
        <View style={styles.body}>
          <Text style={styles.bodyText} selectable testID="outbox-text">
            {message.text?.trimEnd() || '(no plain-text body)'}
          </Text>
        </View>
        {message.hasHtml ? <Note>The message also has an HTML version, not shown here.</Note> : null}
      </Section>
      {message.calendar ? (
        <Section title="Calendar invitation" testID="outbox-calendar">
          <OutboxInvitation calendar={message.calendar} viewerZone={zone} />
        </Section>
      ) : null}
      <Section title="Attachments">
        {message.attachments.length === 0 ? <Note>None.</Note> : null}
        {message.attachments.map((a, i) => (
          <Text key={`${a.filename}-${i}`} style={styles.attachment}>
            {`${a.filename ?? '(unnamed)'} · ${a.contentType} · ${formatSizeBytes(a.sizeBytes)}`}
          </Text>
        ))}
      </Section>
      <OutboxRaw message={message} />
    </DetailFrame>
  );
}

const styles = StyleSheet.create({
  body: { backgroundColor: colors.surface, borderColor: colors.border, borderWidth: 1, borderRadius: radii.md, padding: space.md },
  bodyText: { ...type.body, color: colors.ink },
  attachment: { ...type.body, color: colors.ink },
});
