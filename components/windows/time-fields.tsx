// A date and a clock time side by side, read in the viewer's zone; one error line for the pair.
import { StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  label: string;
  date: string;
  time: string;
  onChange: (next: { date: string; time: string }) => void;
  error?: string;
  testID: string;
  disabled?: boolean;
};

export function TimeFields({ label, date, time, onChange, error, testID, disabled = false }: Props) {
  const border = { borderColor: error ? colors.danger : colors.border };
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <TextInput
          testID={`${testID}-date`}
          accessibilityLabel={`${label} date (YYYY-MM-DD)`}
          aria-invalid={error ? true : undefined}
          value={date}
          onChangeText={(next) => onChange({ date: next, time })}
          placeholder="YYYY-MM-DD"
          placeholderTextColor={colors.inkFaint}
          inputMode="numeric"
          maxLength={10}
          editable={!disabled}
          style={[styles.input, styles.date, border]}
        />
        <TextInput
          testID={`${testID}-time`}
          accessibilityLabel={`${label} time (HH:MM, 24-hour)`}
          aria-invalid={error ? true : undefined}
          value={time}
          onChangeText={(next) => onChange({ date, time: next })}
          placeholder="HH:MM"
          placeholderTextColor={colors.inkFaint}
          inputMode="numeric"
          maxLength={5}
          editable={!disabled}
          style={[styles.input, styles.time, border]}
        />
      </View>
      {error ? <Text style={styles.error} role="alert" testID={`${testID}-error`}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  row: { flexDirection: 'row', gap: space.sm },
  input: {
    ...type.body, color: colors.ink, backgroundColor: colors.surface, borderWidth: 1.5, borderRadius: radii.md,
    paddingHorizontal: space.md, paddingVertical: space.sm + 2,
  },
  date: { flex: 3, minWidth: 0 },
  time: { flex: 2, minWidth: 0 },
  error: { ...type.caption, color: colors.danger },
});
