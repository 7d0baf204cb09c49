// A date and a clock time side by side, read in the viewer's zone, each with a picker; one error line for the pair.
// Typing stays lenient ("20270108 0100", "8 Jan 2027", "1:00") and is tidied to YYYY-MM-DD and HH:MM on leaving
// the field; keyboards keep "-" and ":" (no numeric keypad).
import { useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { DatePicker, TimePicker } from '@/components/date-time-picker';
import { dayKeyAt } from '@/components/time';
import { parseLooseDate, parseLooseTime, splitLooseDateTime } from '@/components/windows/zoned-time';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  label: string;
  date: string;
  time: string;
  onChange: (next: { date: string; time: string }) => void;
  error?: string;
  testID: string;
  /** Names the pickers: `date-picker-<pickerName>`, `time-picker-<pickerName>`. */
  pickerName: string;
  /** The viewer's zone: the date picker opens on today there when no date is typed yet. */
  timeZone: string;
  disabled?: boolean;
};

/** A picker button's name: its visible word first (speech users say what they see), then which field it fills. */
export function pickerButtonName(word: 'Date' | 'Time', fieldLabel: string): string {
  return `${word} (${fieldLabel}): pick from a ${word === 'Date' ? 'calendar' : 'list'}`;
}

/** The pair as typed, tidied where it reads as a date and time; left alone where it does not (the check says why). */
export function tidyDateTime(date: string, time: string): { date: string; time: string } {
  const both = splitLooseDateTime(date);
  if (both && !time.trim()) return both;
  if (both) return { date: both.date, time };
  return { date: parseLooseDate(date) ?? date, time: parseLooseTime(time) ?? time };
}

export function TimeFields({ label, date, time, onChange, error, testID, pickerName, timeZone, disabled = false }: Props) {
  const [open, setOpen] = useState<'date' | 'time' | null>(null);
  const border = { borderColor: error ? colors.danger : colors.borderControl };
  const tidy = () => {
    const next = tidyDateTime(date, time);
    if (next.date !== date || next.time !== time) onChange(next);
  };
  const toggle = (which: 'date' | 'time') => setOpen((current) => (current === which ? null : which));
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
          onBlur={tidy}
          placeholder="YYYY-MM-DD"
          placeholderTextColor={colors.inkFaint}
          keyboardType="numbers-and-punctuation"
          autoCapitalize="none"
          autoCorrect={false}
          maxLength={32}
          editable={!disabled}
          style={[styles.input, styles.date, border]}
        />
        <Pressable role="button" accessibilityLabel={pickerButtonName('Date', label)} aria-expanded={open === 'date'} disabled={disabled}
          onPress={() => toggle('date')} style={[styles.pick, open === 'date' && styles.pickOpen]} testID={`${testID}-date-pick`}>
          <Text style={styles.pickText}>Date</Text>
        </Pressable>
        <TextInput
          testID={`${testID}-time`}
          accessibilityLabel={`${label} time (HH:MM, 24-hour)`}
          aria-invalid={error ? true : undefined}
          value={time}
          onChangeText={(next) => onChange({ date, time: next })}
          onBlur={tidy}
          placeholder="HH:MM"
          placeholderTextColor={colors.inkFaint}
          keyboardType="numbers-and-punctuation"
          autoCapitalize="none"
          autoCorrect={false}
          maxLength={8}
          editable={!disabled}
          style={[styles.input, styles.time, border]}
        />
        <Pressable role="button" accessibilityLabel={pickerButtonName('Time', label)} aria-expanded={open === 'time'} disabled={disabled}
          onPress={() => toggle('time')} style={[styles.pick, open === 'time' && styles.pickOpen]} testID={`${testID}-time-pick`}>
          <Text style={styles.pickText}>Time</Text>
        </Pressable>
      </View>
      {open === 'date' ? (
        <DatePicker value={parseLooseDate(date)} fallbackDay={dayKeyAt(Date.now(), timeZone)} testID={`date-picker-${pickerName}`}
          onPick={(day) => { onChange({ date: day, time }); setOpen(null); }} />
      ) : null}
      {open === 'time' ? (
        <TimePicker value={parseLooseTime(time)} testID={`time-picker-${pickerName}`}
          onPick={(picked) => { onChange({ date, time: picked }); setOpen(null); }} />
      ) : null}
      {error ? <Text style={styles.error} role="alert" testID={`${testID}-error`}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  row: { flexDirection: 'row', gap: space.xs, alignItems: 'stretch' },
  input: {
    ...type.body, color: colors.ink, backgroundColor: colors.surface, borderWidth: 1.5, borderRadius: radii.md,
    paddingHorizontal: space.sm, paddingVertical: space.sm + 2,
  },
  date: { flex: 3, minWidth: 0 },
  time: { flex: 2, minWidth: 0 },
  pick: { justifyContent: 'center', paddingHorizontal: space.sm, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  pickOpen: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  pickText: { ...type.label, color: colors.primary },
  error: { ...type.caption, color: colors.danger },
});
