// The list side of a list-beside-detail area (SplitView): the area's title, an optional line on what it holds,
// then the list or its loading, error or empty state filling the rest.
import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { useListHeadingLevel } from '@/components/inventory/split-view';
import { colors, space, type } from '@/constants/theme';

type Props = { title: string; hint?: string; testID: string; children: ReactNode };

export function ListPane({ title, hint, testID, children }: Props) {
  const headingLevel = useListHeadingLevel();
  return (
    <View style={styles.pane} testID={testID}>
      <Text style={styles.title} role="heading" aria-level={headingLevel}>{title}</Text>
      {hint ? <Text style={styles.hint}>{hint}</Text> : null}
      <View style={styles.body}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { flex: 1, gap: space.sm, padding: space.md },
  title: { ...type.display, color: colors.abyss },
  hint: { ...type.body, color: colors.inkMuted },
  body: { flex: 1 },
});
