// The one row of counts every screen shows for a window's slices (shared/touch-counts.ts): touched, of which must move
// and lose protection, those that cannot be kept, and the untouched ones moved to make room. Each figure has testID
// `touch-count-<key>` so the screens can be checked against each other.
import { StyleSheet, Text, View } from 'react-native';
import { TOUCH_COUNT_KEYS, TOUCH_COUNT_WORDS, type TouchCountKey, type TouchCounts } from '@/shared/touch-counts';
import { colors, radii, space, type } from '@/constants/theme';

/** How the figures nest: the second and third split the first; the fourth is part of the second. */
const NESTED: Partial<Record<TouchCountKey, string>> = {
  mustMove: 'of the touched',
  protectionLost: 'of the touched',
  unresolved: 'of those that must move',
};

export function touchCountsSentence(c: TouchCounts): string {
  const parts = [
    `${c.touched} touched ${c.touched === 1 ? 'slice' : 'slices'}: ${c.mustMove} must move, ${c.protectionLost} lose protection but stay up`,
  ];
  if (c.unresolved !== null) parts.push(`${c.unresolved} cannot be kept`);
  if (c.knockOn !== null) parts.push(`${c.knockOn} more moved to make room`);
  return parts.join(' · ');
}

export function TouchCountsView({ counts, showDefinitions = false }: { counts: TouchCounts; showDefinitions?: boolean }) {
  return (
    <View style={styles.box} testID="touch-counts" accessibilityLabel={touchCountsSentence(counts)}>
      <View style={styles.tiles}>
        {TOUCH_COUNT_KEYS.map((key) => {
          const value = counts[key];
          const alarm = key === 'unresolved' && (value ?? 0) > 0;
          return (
            <View key={key} style={styles.tile}>
              <Text style={[styles.value, alarm && styles.alarm]} testID={`touch-count-${key}`}>
                {value === null ? '–' : String(value)}
              </Text>
              <Text style={styles.label}>{TOUCH_COUNT_WORDS[key].label}</Text>
              {NESTED[key] ? <Text style={styles.hint}>{NESTED[key]}</Text> : null}
              {value === null ? <Text style={styles.hint}>known once a plan is run</Text> : null}
            </View>
          );
        })}
      </View>
      {showDefinitions ? (
        <View style={styles.definitions} testID="touch-count-definitions">
          {TOUCH_COUNT_KEYS.map((key) => (
            <Text key={key} style={styles.hint}>
              <Text style={styles.term}>{TOUCH_COUNT_WORDS[key].label}: </Text>{TOUCH_COUNT_WORDS[key].definition}
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  tiles: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  tile: {
    flexGrow: 1, flexBasis: '30%', minWidth: 96, padding: space.sm, borderRadius: radii.md, backgroundColor: colors.surface,
    borderWidth: 1, borderColor: colors.border, gap: space.xxs,
  },
  value: { ...type.figure, color: colors.abyss },
  alarm: { color: colors.danger },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.caption, color: colors.inkMuted },
  term: { ...type.caption, color: colors.ink, fontWeight: '600' },
  definitions: { gap: space.xxs },
});
