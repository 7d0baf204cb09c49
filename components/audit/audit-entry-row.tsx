// One audit entry: when (the viewer's zone, UTC beneath), who by name, what in words, the window or object by
// name (a link where it has a screen), the changed fields in words and the comment.
import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { AuditEntry } from '@/shared/audit';
import { ZonedWhen } from '@/components/time/zoned-when';
import { colors, space, type } from '@/constants/theme';

function Subject({ entry }: { entry: AuditEntry }) {
  const s = entry.subject;
  if (!s) return null;
  if (!s.href) return <Text style={styles.subject} testID="audit-row-subject">{s.kind} <Text style={styles.name}>{s.name}</Text></Text>;
  return (
    <Text style={styles.subject} testID="audit-row-subject">
      {s.kind}{' '}
      <Link href={s.href as Href} asChild>
        <Pressable role="link" accessibilityLabel={`${s.kind} ${s.name}`} testID="audit-row-subject-link">
          <Text style={styles.link}>{s.name}</Text>
        </Pressable>
      </Link>
    </Text>
  );
}

export function AuditEntryRow({ entry, timeZone }: { entry: AuditEntry; timeZone: string }) {
  return (
    <View style={styles.row} testID="audit-row" role="listitem">
      <ZonedWhen startsAt={entry.at} timeZone={timeZone} style={styles.when} testID="audit-row-when" />
      <View style={styles.body}>
        <Text style={styles.what}>
          <Text testID="audit-row-who">{entry.who ?? 'The system or someone no longer listed'}</Text>
          <Text style={styles.dash}> — </Text>
          <Text testID="audit-row-what">{entry.what}</Text>
        </Text>
        <Subject entry={entry} />
        {entry.changes.length > 0 ? (
          <View testID="audit-row-changes">
            {entry.changes.map((line) => <Text key={line} style={styles.change}>• {line}</Text>)}
          </View>
        ) : null}
        {entry.comment ? <Text style={styles.comment} testID="audit-row-comment">“{entry.comment}”</Text> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.border },
  when: { ...type.caption, color: colors.inkMuted },
  body: { flexGrow: 1, flexShrink: 1, flexBasis: 280, gap: space.xxs },
  what: { ...type.bodyStrong, color: colors.ink },
  dash: { color: colors.inkMuted },
  subject: { ...type.body, color: colors.inkMuted },
  name: { color: colors.ink },
  link: { ...type.body, color: colors.primary, textDecorationLine: 'underline' },
  change: { ...type.body, color: colors.ink },
  comment: { ...type.body, color: colors.ink, fontStyle: 'italic' },
});
