// The Slices screen's list side: the slices table, marking the one whose detail is open.
import { usePathname, useRouter } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { selectionFromPath } from '@/components/inventory/selection';
import { SlicesTable } from '@/components/inventory/slices-table';
import { useListHeadingLevel } from '@/components/inventory/split-view';
import { colors, space, type } from '@/constants/theme';

export function SliceLists() {
  const headingLevel = useListHeadingLevel();
  const router = useRouter();
  const selection = selectionFromPath(usePathname());
  return (
    <View style={styles.pane} testID="slice-lists">
      <Text style={styles.title} role="heading" aria-level={headingLevel}>
        Slices
      </Text>
      <View style={styles.body}>
        <SlicesTable
          selectedId={selection?.kind === 'slice' ? selection.id : null}
          onOpen={(id) => router.push({ pathname: '/slices/[id]', params: { id } })}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { flex: 1, gap: space.sm, padding: space.md },
  title: { ...type.display, color: colors.abyss },
  body: { flex: 1 },
});
