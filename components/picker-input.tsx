// A typed date or clock time with the button that opens its picker beside it: the booking form's start and end and
// the slot finder's nights and allowed hours. Keyboards keep "-" and ":" (no numeric keypad); the caller tidies the
// value on leaving the field and draws the picker itself, below its row.
import { Pressable, StyleSheet, Text, TextInput, type StyleProp, type TextStyle } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

/** A picker button's name: its visible word first (speech users say what they see), then which field it fills. */
export function pickerButtonName(word: 'Date' | 'Time', fieldLabel: string): string {
  return `${word} (${fieldLabel}): pick from a ${word === 'Date' ? 'calendar' : 'list'}`;
}

type Props = {
  kind: 'date' | 'time';
  /** the field's visible label, which names the picker button */
  fieldLabel: string;
  /** the input's own name, with the format it takes */
  accessibilityLabel: string;
  value: string;
  onChangeText: (value: string) => void;
  onBlur: () => void;
  invalid: boolean;
  disabled: boolean;
  open: boolean;
  onToggle: () => void;
  maxLength: number;
  inputStyle?: StyleProp<TextStyle>;
  testID: string;
  pickTestID: string;
};

export function PickerInput(p: Props) {
  const word = p.kind === 'date' ? 'Date' : 'Time';
  return (
    <>
      <TextInput
        testID={p.testID}
        accessibilityLabel={p.accessibilityLabel}
        aria-invalid={p.invalid || undefined}
        value={p.value}
        onChangeText={p.onChangeText}
        onBlur={p.onBlur}
        placeholder={p.kind === 'date' ? 'YYYY-MM-DD' : 'HH:MM'}
        placeholderTextColor={colors.inkFaint}
        keyboardType="numbers-and-punctuation"
        autoCapitalize="none"
        autoCorrect={false}
        maxLength={p.maxLength}
        editable={!p.disabled}
        style={[styles.input, p.inputStyle, { borderColor: p.invalid ? colors.danger : colors.borderControl }]}
      />
      <Pressable role="button" accessibilityLabel={pickerButtonName(word, p.fieldLabel)} aria-expanded={p.open} disabled={p.disabled}
        onPress={p.onToggle} style={[styles.pick, p.open && styles.pickOpen]} testID={p.pickTestID}>
        <Text style={styles.pickText}>{word}</Text>
      </Pressable>
    </>
  );
}

const styles = StyleSheet.create({
  input: {
    ...type.body, minWidth: 0, minHeight: 44, color: colors.ink, backgroundColor: colors.surface, borderWidth: 1.5, borderRadius: radii.md,
    paddingHorizontal: space.sm, paddingVertical: space.sm + 2,
  },
  pick: {
    justifyContent: 'center', paddingHorizontal: space.sm, minHeight: 44, borderRadius: radii.md, borderWidth: 1,
    borderColor: colors.border, backgroundColor: colors.surface,
  },
  pickOpen: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  pickText: { ...type.label, color: colors.primary },
});
