// A date and a clock time side by side, read in the viewer's zone, each with a picker; one error line for the pair.
// Typing stays lenient ("20270108 0100", "8 Jan 2027", "1:00") and is tidied to YYYY-MM-DD and HH:MM on leaving
// the field; keyboards keep "-" and ":" (no numeric keypad).
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { PickerInput } from '@/components/picker-input';

export { pickerButtonName } from '@/components/picker-input';
import { DatePicker, TimePicker } from '@/components/date-time-picker';
import { dayKeyAt } from '@/components/time';
import { parseLooseDate, parseLooseTime, splitLooseDateTime } from '@/components/windows/zoned-time';
import { colors, space, type } from '@/constants/theme';

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


/** The pair as typed, tidied where it reads as a date and time; left alone where it does not (the check says why). */
export function tidyDateTime(date: string, time: string): { date: string; time: string } {
  const both = splitLooseDateTime(date);
  if (both && !time.trim()) return both;
  if (both) return { date: both.date, time };
  return { date: parseLooseDate(date) ?? date, time: parseLooseTime(time) ?? time };
}

export function TimeFields({ label, date, time, onChange, error, testID, pickerName, timeZone, disabled = false }: Props) {
  const [open, setOpen] = useState<'date' | 'time' | null>(null);
  const tidy = () => {
    const next = tidyDateTime(date, time);
    if (next.date !== date || next.time !== time) onChange(next);
  };
  const toggle = (which: 'date' | 'time') => setOpen((current) => (current === which ? null : which));
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <PickerInput kind="date" fieldLabel={label} accessibilityLabel={`${label} date (YYYY-MM-DD)`} value={date}
          onChangeText={(next) => onChange({ date: next, time })} onBlur={tidy} invalid={Boolean(error)} disabled={disabled}
          open={open === 'date'} onToggle={() => toggle('date')} maxLength={32} inputStyle={styles.date}
          testID={`${testID}-date`} pickTestID={`${testID}-date-pick`} />
        <PickerInput kind="time" fieldLabel={label} accessibilityLabel={`${label} time (HH:MM, 24-hour)`} value={time}
          onChangeText={(next) => onChange({ date, time: next })} onBlur={tidy} invalid={Boolean(error)} disabled={disabled}
          open={open === 'time'} onToggle={() => toggle('time')} maxLength={8} inputStyle={styles.time}
          testID={`${testID}-time`} pickTestID={`${testID}-time-pick`} />
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
  date: { flex: 3 },
  time: { flex: 2 },
  error: { ...type.caption, color: colors.danger },
});
