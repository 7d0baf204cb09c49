// A row of mutually exclusive choices (list switches, filters): a radio group with one Tab stop; the chosen one is
// filled and carries a tick, so the choice does not rest on colour alone.
import { Pressable, StyleSheet, Text } from 'react-native';
import { ChipRow } from '@/components/chip-row';
import { useRovingChoice } from '@/components/roving-focus';
import { colors, radii, space, type } from '@/constants/theme';

export type Choice<V extends string> = { value: V; label: string };

type Props<V extends string> = { choices: readonly Choice<V>[]; value: V; onChange: (value: V) => void; testID: string; label: string };

export function Segmented<V extends string>({ choices, value, onChange, testID, label }: Props<V>) {
  const itemProps = useRovingChoice(choices.length, choices.findIndex((c) => c.value === value), (index) => {
    const next = choices[index];
    if (next && next.value !== value) onChange(next.value);
  });
  return (
    <ChipRow testID={`${testID}-strip`} backgroundColor={colors.tide} role="radiogroup" label={label}>
      {choices.map((choice, index) => {
        const active = choice.value === value;
        return (
          <Pressable
            key={choice.value}
            testID={`${testID}-${choice.value}`}
            role="radio"
            aria-checked={active}
            onPress={() => onChange(choice.value)}
            style={[styles.choice, active && styles.active]}
            {...itemProps(index)}
          >
            <Text style={[styles.text, active && styles.activeText]}>
              {active ? <Text aria-hidden>{'✓ '}</Text> : null}
              {choice.label}
            </Text>
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
