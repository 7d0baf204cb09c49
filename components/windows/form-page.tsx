// Frame of the booking and edit screens, and the small route helpers they share with the window page.
import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, Text, View } from 'react-native';
import type { WindowFlash } from '@/components/windows/window-notices';
import { colors, space, type } from '@/constants/theme';

/** Form column width: wide enough for date and time side by side, narrow enough to read. */
const FORM_MAX_WIDTH_PX = 640;

export function FormPage({ title, children }: { title: string; children: ReactNode }) {
  return (
    <ScrollView contentContainerStyle={styles.page} keyboardShouldPersistTaps="handled">
      <View style={styles.column}>
        <Text style={styles.title} role="heading" aria-level={1}>{title}</Text>
        {children}
      </View>
    </ScrollView>
  );
}

/** The window page's address, with what the save reported as search parameters (read back by flashFromParams). */
export function detailHref(o: { id: string; saved?: 'booked' | 'edited'; reverted?: boolean; mopError?: string | null }): string {
  const query = new URLSearchParams();
  if (o.saved) query.set('saved', o.saved);
  if (o.reverted) query.set('reverted', '1');
  if (o.mopError) query.set('mop', o.mopError);
  const text = query.toString();
  return `/windows/${encodeURIComponent(o.id)}${text ? `?${text}` : ''}`;
}

export function flashFromParams(params: { saved?: string; reverted?: string; mop?: string }): WindowFlash {
  const saved = params.saved === 'booked' || params.saved === 'edited' ? params.saved : undefined;
  return { saved, reverted: params.reverted === '1', mopError: params.mop ?? null };
}

const styles = StyleSheet.create({
  page: { padding: space.lg, alignItems: 'center' },
  column: { width: '100%', maxWidth: FORM_MAX_WIDTH_PX, gap: space.lg },
  title: { ...type.title, color: colors.abyss },
});
