// A day for the audit trail's date range: a button naming the day (or "Any day") that opens a month to tap a day
// on, with a way to clear it.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { DatePicker } from '@/components/date-time-picker';
import { colors, radii, space, type } from '@/constants/theme';

const dayFormat = new Intl.DateTimeFormat('en-GB', { timeZone: 'UTC', weekday: 'short', day: 'numeric', month: 'short', year: 'numeric' });

/** "Thu 3 Dec 2026" for the calendar day '2026-12-03'. */
export function dayLabel(day: string): string {
  const [y, m, d] = day.split('-').map(Number);
  return dayFormat.format(new Date(Date.UTC(y, m - 1, d))).replace(',', '');
}

type Props = { label: string; value: string | null; onChange: (day: string | null) => void; fallbackDay: string; testID: string };

export function DayField({ label, value, onChange, fallbackDay, testID }: Props) {
  const [open, setOpen] = useState(false);
  const current = value ? dayLabel(value) : 'Any day';
  return (
    <View style={styles.field}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <Pressable
          role="button" aria-expanded={open} accessibilityLabel={`${label}: ${current}`} testID={testID}
          onPress={() => setOpen(!open)} style={[styles.button, value !== null && styles.buttonSet]}
        >
          <Text style={styles.buttonText}>{current}</Text>
        </Pressable>
        {value ? (
          <Pressable role="button" accessibilityLabel={`Clear ${label.toLowerCase()}`} testID={`${testID}-clear`} onPress={() => onChange(null)} style={styles.clear}>
            <Text style={styles.clearText}>Clear</Text>
          </Pressable>
        ) : null}
      </View>
      {open ? (
        <DatePicker value={value} fallbackDay={fallbackDay} testID={`${testID}-picker`} onPick={(day) => { onChange(day); setOpen(false); }} />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs, minWidth: 160, flexGrow: 1, flexBasis: 160 },
  label: { ...type.label, color: colors.ink },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  button: {
    flexGrow: 1, minHeight: 44, justifyContent: 'center', paddingHorizontal: space.md,
    borderWidth: 1, borderColor: colors.borderControl, borderRadius: radii.md, backgroundColor: colors.surface,
  },
  buttonSet: { borderColor: colors.primary },
  buttonText: { ...type.body, color: colors.ink },
  clear: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.sm },
  clearText: { ...type.label, color: colors.primary },
});
