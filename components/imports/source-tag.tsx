// A value with a small word after it saying where it came from: the file, a default, or derived (not colour alone).
import { StyleSheet, Text, View } from 'react-native';
import type { ValueSource } from '@/shared/imports';
import { colors, radii, space, type } from '@/constants/theme';

export const SOURCE_LABELS: Record<ValueSource, string> = { file: 'from file', default: 'default', derived: 'derived' };

/** What the counts call each source, with the unit they count in. */
export const SOURCE_COUNT_LABELS: Record<ValueSource, string> = {
  file: 'values from the file',
  default: 'values from defaults',
  derived: 'values derived',
};

export function SourceTag({ source, testID }: { source: ValueSource; testID?: string }) {
  return (
    <Text style={[styles.tag, source !== 'file' && styles.filled]} testID={testID}>
      {SOURCE_LABELS[source]}
    </Text>
  );
}

/** A cell: the value (with its unit) and, when known, its source tag; "—" when the value is absent. */
export function SourcedValue({ text, source, testID }: { text: string | null; source: ValueSource | undefined; testID?: string }) {
  return (
    <View style={styles.cell} testID={testID}>
      <Text style={styles.value}>{text ?? '—'}</Text>
      {source ? <SourceTag source={source} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  cell: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: space.xs },
  value: { ...type.body, color: colors.ink },
  tag: {
    ...type.caption,
    color: colors.inkMuted,
    borderWidth: 1,
    borderColor: colors.borderControl,
    borderRadius: radii.pill,
    paddingHorizontal: space.xs + 2,
    overflow: 'hidden',
  },
  filled: { color: colors.ink, backgroundColor: colors.primarySoft, borderColor: colors.primary },
});
