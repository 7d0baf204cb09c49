// The frame around signed-out pages: the product's mark and name above a centred card.
import type { ReactNode } from 'react';
import { Link, type Href } from 'expo-router';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { LogoMark } from '@/components/icons';
import { colors, radii, space, type } from '@/constants/theme';

/** A link under a signed-out page's card content (back to sign-in, ask for a new link), in the app's type. */
export function AuthLink({ href, testID, children }: { href: Href; testID: string; children: string }) {
  return <Link href={href} testID={testID} style={styles.link}>{children}</Link>;
}

export function AuthFrame({ title, children }: { title: string; children: ReactNode }) {
  return (
    <ScrollView style={styles.page} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      <View style={styles.column}>
        <View style={styles.brand}>
          <LogoMark size={40} />
          <View>
            <Text style={styles.name}>Slackwater</Text>
            <Text style={styles.tagline}>Maintenance windows that keep slices whole</Text>
          </View>
        </View>
        <View style={styles.card}>
          <Text style={styles.title} role="heading">
            {title}
          </Text>
          {children}
        </View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.tide },
  content: { flexGrow: 1, alignItems: 'center', justifyContent: 'center', padding: space.lg },
  column: { width: '100%', maxWidth: 400, gap: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  name: { ...type.title, color: colors.abyss },
  tagline: { ...type.caption, color: colors.inkMuted },
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: space.xl,
    gap: space.lg,
  },
  title: { ...type.heading, color: colors.ink },
  link: { ...type.bodyStrong, color: colors.primary, textDecorationLine: 'underline', alignSelf: 'flex-start', paddingVertical: space.xs },
});
