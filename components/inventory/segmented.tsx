// A row of mutually exclusive choices (list tabs, filters); the chosen one is filled.
import { Pressable, StyleSheet, Text } from 'react-native';
import { ChipRow } from '@/components/chip-row';
import { colors, radii, space, type } from '@/constants/theme';

export type Choice<V extends string> = { value: V; label: string };

type Props<V extends string> = { choices: readonly Choice<V>[]; value: V; onChange: (value: V) => void; testID: string; label: string };

export function Segmented<V extends string>({ choices, value, onChange, testID, label }: Props<V>) {
  return (
    <ChipRow testID={`${testID}-strip`} backgroundColor={colors.tide} role="tablist" label={label}>
      {choices.map((choice) => {
        const active = choice.value === value;
        return (
          <Pressable
            key={choice.value}
            testID={`${testID}-${choice.value}`}
            role="tab"
            aria-selected={active}
            onPress={() => onChange(choice.value)}
            style={[styles.choice, active && styles.active]}
          >
            <Text style={[styles.text, active && styles.activeText]}>{choice.label}</Text>
          </Pressable>
        );
      })}
    </ChipRow>
  );
}

const styles = StyleSheet.create({
  choice: {
    paddingHorizontal: space.md,
    paddingVertical: space.xs + 2,
    borderRadius: radii.pill,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
    minHeight: 32,
    justifyContent: 'center',
  },
  active: { backgroundColor: colors.primary, borderColor: colors.primary },
  text: { ...type.label, color: colors.inkMuted },
  activeText: { color: colors.onPrimary },
});
