// A row of single-choice chips (work type, down/reduced): a radio group people can tap with a thumb.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Choice = { value: string; label: string };
type Props = { label: string; choices: readonly Choice[]; value: string; onChange: (value: string) => void; testID: string; disabled?: boolean };

export function ChoiceChips({ label, choices, value, onChange, testID, disabled = false }: Props) {
  return (
    <View style={styles.row} role="radiogroup" aria-label={label} testID={testID}>
      {choices.map((choice) => {
        const selected = choice.value === value;
        return (
          <Pressable
            key={choice.value}
            role="radio"
            aria-checked={selected}
            accessibilityState={{ checked: selected, disabled }}
            accessibilityLabel={choice.label}
            testID={`${testID}-${choice.value.replace(/\s+/g, '-')}`}
            disabled={disabled}
            onPress={() => onChange(selected ? '' : choice.value)}
            style={[styles.chip, selected && styles.selected]}
          >
            <Text style={[styles.text, selected && styles.selectedText]}>{choice.label}</Text>
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
