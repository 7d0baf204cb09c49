// A row of single-choice chips (work type, down/reduced): a radio group people can tap with a thumb, with one Tab
// stop and arrow keys inside; tapping the chosen chip again clears the choice.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { useRovingChoice } from '@/components/roving-focus';
import { colors, radii, space, type } from '@/constants/theme';

type Choice = { value: string; label: string };
type Props = { label: string; choices: readonly Choice[]; value: string; onChange: (value: string) => void; testID: string; disabled?: boolean };

export function ChoiceChips({ label, choices, value, onChange, testID, disabled = false }: Props) {
  const itemProps = useRovingChoice(choices.length, choices.findIndex((c) => c.value === value), (index) => {
    const next = choices[index];
    if (!disabled && next && next.value !== value) onChange(next.value);
  });
  return (
    <View style={styles.row} role="radiogroup" aria-label={label} aria-disabled={disabled || undefined} testID={testID}>
      {choices.map((choice, index) => {
        const selected = choice.value === value;
        const roving = itemProps(index);
        return (
          <Pressable
            key={choice.value}
            role="radio"
            aria-checked={selected}
            testID={`${testID}-${choice.value.replace(/\s+/g, '-')}`}
            disabled={disabled}
            onPress={() => onChange(selected ? '' : choice.value)}
            style={[styles.chip, selected && styles.selected]}
            {...roving}
            tabIndex={disabled ? -1 : roving.tabIndex}
          >
            <Text style={[styles.text, selected && styles.selectedText]}>
              {selected ? <Text aria-hidden>{'✓ '}</Text> : null}
              {choice.label}
            </Text>
          </Pressable>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    borderWidth: 1.5,
    borderColor: colors.border,
    borderRadius: radii.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs + 2,
    backgroundColor: colors.surface,
    minHeight: 36,
    justifyContent: 'center',
  },
  selected: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  text: { ...type.label, color: colors.ink },
  selectedText: { color: colors.primary },
});
