// A toggle chip for the calendar's filters (a toggle button, so Space and Enter both work), with an optional tone dot
// (statuses double as the colour legend); a chosen chip shows a tick besides its colour.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { label: string; selected: boolean; onPress: () => void; testID: string; tone?: string };

export function FilterChip({ label, selected, onPress, testID, tone }: Props) {
  return (
    <Pressable
      role="button"
      aria-pressed={selected}
      testID={testID}
      onPress={onPress}
      style={({ pressed }) => [styles.chip, selected && styles.selected, pressed && styles.pressed]}
    >
      {tone ? <View style={[styles.dot, { backgroundColor: tone }]} /> : null}
      <Text style={[styles.text, selected && styles.selectedText]}>
        {selected ? <Text aria-hidden>{'✓ '}</Text> : null}
        {label}
      </Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xs,
    paddingHorizontal: space.md,
    minHeight: 32,
    borderRadius: radii.pill,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  selected: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  pressed: { opacity: 0.8 },
  dot: { width: 10, height: 10, borderRadius: radii.pill },
  text: { ...type.label, color: colors.inkMuted },
  selectedText: { color: colors.primary },
});
