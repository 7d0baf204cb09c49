// One filter of the audit trail: a button naming the current choice that opens an inline list to pick from, with
// "Any" first to clear it. Inline rather than a pop-over, so it fits a 390 px phone and works with a keyboard.
import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export type PickerOption = { value: string; label: string };

type Props = {
  label: string;
  options: readonly PickerOption[];
  value: string | null;
  onChange: (value: string | null) => void;
  /** what "no choice" reads as, e.g. "Any window" */
  anyLabel: string;
  testID: string;
};

/** Option test ids: values are ids or codes; anything but letters, digits, dot and dash becomes a dash. */
export const optionTestId = (testID: string, value: string) => `${testID}-option-${value.replace(/[^\w.-]+/g, '-')}`;

export function FilterPicker({ label, options, value, onChange, anyLabel, testID }: Props) {
  const [open, setOpen] = useState(false);
  const current = options.find((o) => o.value === value)?.label ?? anyLabel;
  const pick = (next: string | null) => {
    onChange(next);
    setOpen(false);
  };
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <Pressable
        role="button" aria-expanded={open} accessibilityLabel={`${label}: ${current}`} testID={testID}
        onPress={() => setOpen(!open)} style={[styles.button, value !== null && styles.buttonSet]}
      >
        <Text style={styles.buttonText} numberOfLines={1}>{current}</Text>
        <Text style={styles.chevron} aria-hidden>{open ? '▴' : '▾'}</Text>
      </Pressable>
      {open ? (
        <ScrollView style={styles.list} nestedScrollEnabled testID={`${testID}-options`}>
          {[{ value: null, label: anyLabel }, ...options].map((o) => {
            const selected = o.value === value;
            return (
              <Pressable
                key={o.value ?? ''} role="radio" aria-checked={selected} onPress={() => pick(o.value)}
                testID={o.value === null ? `${testID}-option-any` : optionTestId(testID, o.value)}
                style={[styles.option, selected && styles.optionSelected]}
              >
                <Text style={[styles.optionText, selected && styles.optionTextSelected]}>{selected ? '✓ ' : ''}{o.label}</Text>
              </Pressable>
            );
          })}
        </ScrollView>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, minWidth: 200, flexGrow: 1, flexBasis: 200 },
  label: { ...type.label, color: colors.ink },
  button: {
    flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, minHeight: 44,
    paddingHorizontal: space.md, borderWidth: 1, borderColor: colors.borderControl, borderRadius: radii.md, backgroundColor: colors.surface,
  },
  buttonSet: { borderColor: colors.primary },
  buttonText: { ...type.body, color: colors.ink, flexShrink: 1 },
  chevron: { ...type.body, color: colors.inkMuted },
  list: { maxHeight: 240, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.surface },
  option: { paddingHorizontal: space.md, paddingVertical: space.sm, minHeight: 44, justifyContent: 'center' },
  optionSelected: { backgroundColor: colors.primary },
  optionText: { ...type.body, color: colors.ink },
  optionTextSelected: { color: colors.onPrimary },
});
