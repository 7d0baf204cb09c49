// A panel on the overview that asks for one action: a sentence, a line of why, and a link to where it is done.
import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { testID: string; lead: string; body: string; href: Href; action: string; accent?: string };

export function ActionPanel({ testID, lead, body, href, action, accent = colors.buoy }: Props) {
  return (
    <View style={[styles.panel, { borderLeftColor: accent }]} testID={testID}>
      <View style={styles.text}>
        <Text style={styles.lead} role="heading" aria-level={2}>{lead}</Text>
        <Text style={styles.body}>{body}</Text>
      </View>
      <Link href={href} asChild>
        <Pressable role="link" accessibilityLabel={action} testID={`${testID}-open`}>
          <View style={styles.action}><Text style={styles.actionText}>{action}</Text></View>
        </Pressable>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.md,
    backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border,
    borderLeftWidth: 4, padding: space.lg,
  },
  text: { flex: 1, minWidth: 220, gap: space.xxs },
  lead: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.inkMuted },
  action: { borderRadius: radii.md, backgroundColor: colors.primary, paddingVertical: space.md, paddingHorizontal: space.lg, minHeight: 44, justifyContent: 'center' },
  actionText: { ...type.bodyStrong, color: colors.onPrimary },
});
