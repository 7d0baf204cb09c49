// The frame around signed-out pages: the product's mark and name above a centred card.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import { LogoMark } from '@/components/icons';
import { colors, radii, space, type } from '@/constants/theme';

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
});
