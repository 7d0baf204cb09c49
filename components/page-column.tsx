// A reading screen's frame: the page scrolls and its content sits in one centred column of a readable width.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { CONTENT_MAX_WIDTH_PX, NARROW_CONTENT_MAX_WIDTH_PX, space } from '@/constants/theme';

/** `narrow` for phone-first screens (sign-off, one-time codes), which stay phone-shaped on a desk too. */
export function PageColumn({ narrow = false, children }: { narrow?: boolean; children: ReactNode }) {
  return (
    <ScrollView contentContainerStyle={styles.page}>
      <View style={[styles.column, narrow && styles.narrow]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: CONTENT_MAX_WIDTH_PX, gap: space.md },
  narrow: { maxWidth: NARROW_CONTENT_MAX_WIDTH_PX },
});
