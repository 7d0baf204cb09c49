// The message as sent, folded away under the readable one: the iCalendar text (when there is one) and the .eml download.
import { useState } from 'react';
import { Linking, Platform, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import type { OutboxMessage } from '@/shared/outbox';
import { outboxRawPath } from '@/hooks/queries/outbox';
import { colors, radii, space, type } from '@/constants/theme';

// The theme has no code face; the platform's own monospace keeps columns of the .ics aligned.
const MONOSPACE = Platform.select({ ios: 'Menlo', default: 'monospace' });

export function OutboxRaw({ message }: { message: OutboxMessage }) {
  const [open, setOpen] = useState(false);
  return (
    <View style={styles.box}>
      <Pressable
        role="button"
        aria-expanded={open}
        accessibilityState={{ expanded: open }}
        testID="outbox-raw-toggle"
        onPress={() => setOpen(!open)}
        style={styles.toggle}
      >
        <Text style={styles.toggleText}>{open ? '▾ Hide the raw message' : '▸ Show the raw message'}</Text>
      </Pressable>
      {open ? (
        <View style={styles.body} testID="outbox-raw-body">
          {message.calendar ? (
            <>
              <Text style={styles.label}>The iCalendar part (.ics) as sent</Text>
              <ScrollView horizontal style={styles.codeBox} contentContainerStyle={styles.codeContent}>
                <Text style={styles.code} selectable testID="outbox-ics">
                  {message.calendar.text.replace(/\r\n/g, '\n').trimEnd()}
                </Text>
              </ScrollView>
            </>
          ) : null}
          {/* Opening a link is fire-and-forget: it only rejects when no app can open an http URL, and a browser always can. */}
          <Pressable role="link" testID="outbox-raw" onPress={() => void Linking.openURL(outboxRawPath(message.id))} style={styles.download}>
            <Text style={styles.downloadText}>Download the whole message with its MIME parts (.eml)</Text>
          </Pressable>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, borderTopWidth: 1, borderTopColor: colors.border, paddingTop: space.sm },
  toggle: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
  toggleText: { ...type.bodyStrong, color: colors.primary },
  body: { gap: space.sm },
  label: { ...type.label, color: colors.inkMuted },
  codeBox: { backgroundColor: colors.surfaceSunken, borderRadius: radii.md },
  codeContent: { padding: space.md },
  code: { fontFamily: MONOSPACE, fontSize: 12, lineHeight: 18, color: colors.ink },
  download: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
  downloadText: { ...type.bodyStrong, color: colors.primary },
});
