// The "when" fields shared by the slot finder and the campaign form: hours of work, first and last night (with a
// month picker), allowed hours (with a time list) in the network's zone, and the weekdays as toggle chips.
import { useState, type Ref } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { NETWORK_TIME_ZONE } from '@/shared/time-zone';
import { dayKeyAt } from '@/shared/zone-clock';
import { DatePicker, TimePicker } from '@/components/date-time-picker';
import { TextField } from '@/components/text-field';
import { describeZone } from '@/components/time';
import { PickerInput } from '@/components/picker-input';
import { parseLooseDate, parseLooseTime } from '@/components/windows/zoned-time';
import { colors, radii, space, type } from '@/constants/theme';
import { ALL_WEEKDAYS, WEEKDAY_LABELS, WEEKDAY_NAMES, type TimingErrors, type TimingField, type TimingValues } from './timing-form-state';

type Props = {
  values: TimingValues;
  onChange: (patch: Partial<TimingValues>) => void;
  errors: TimingErrors;
  disabled: boolean;
  /** testID prefix: `slot` gives slot-duration, slot-from, slot-to, slot-hours-start, slot-hours-end, slot-weekday-1 … */
  prefix: string;
  anchor: (key: TimingField) => Ref<View>;
};

type PickerFieldProps = {
  label: string; value: string; onChange: (value: string) => void; kind: 'date' | 'time'; testID: string; disabled: boolean; invalid: boolean;
};

/** One typed value with its picker under it; the value is tidied to YYYY-MM-DD or HH:MM on leaving the field. */
function PickerField({ label, value, onChange, kind, testID, disabled, invalid }: PickerFieldProps) {
  const [open, setOpen] = useState(false);
  const parse = kind === 'date' ? parseLooseDate : parseLooseTime;
  return (
    <View style={styles.pickerField}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <PickerInput kind={kind} fieldLabel={label} value={value} onChangeText={onChange}
          accessibilityLabel={kind === 'date' ? `${label} (YYYY-MM-DD)` : `${label} (HH:MM, 24-hour)`}
          onBlur={() => { const tidy = parse(value); if (tidy && tidy !== value) onChange(tidy); }}
          invalid={invalid} disabled={disabled} open={open} onToggle={() => setOpen((o) => !o)} maxLength={32}
          inputStyle={styles.input} testID={testID} pickTestID={`${testID}-pick`} />
      </View>
      {open && kind === 'date' ? (
        <DatePicker value={parse(value)} fallbackDay={dayKeyAt(Date.now(), NETWORK_TIME_ZONE)} testID={`${testID}-picker`}
          onPick={(day) => { onChange(day); setOpen(false); }} />
      ) : null}
      {open && kind === 'time' ? (
        <TimePicker value={parse(value)} testID={`${testID}-picker`} onPick={(time) => { onChange(time); setOpen(false); }} />
      ) : null}
    </View>
  );
}

function FieldError({ message, testID }: { message?: string; testID: string }) {
  return message ? <Text style={styles.error} role="alert" testID={testID}>{message}</Text> : null;
}

export function TimingFields({ values, onChange, errors, disabled, prefix, anchor }: Props) {
  const zone = describeZone(NETWORK_TIME_ZONE);
  const toggleDay = (day: number) => onChange({
    weekdays: values.weekdays.includes(day) ? values.weekdays.filter((d) => d !== day) : [...values.weekdays, day].sort(),
  });
  return (
    <>
      <View ref={anchor('duration')}>
        <TextField label="Hours of work" testID={`${prefix}-duration`} value={values.durationText} inputMode="decimal"
          onChangeText={(durationText) => onChange({ durationText })} error={errors.duration} editable={!disabled} placeholder="e.g. 4" />
      </View>
      <Text style={styles.zone} testID={`${prefix}-zone`}>Nights and allowed hours in {zone}.</Text>
      <View style={styles.pair}>
        <View style={styles.half} ref={anchor('from')}>
          <PickerField label="First night" kind="date" value={values.fromDate} onChange={(fromDate) => onChange({ fromDate })}
            testID={`${prefix}-from`} disabled={disabled} invalid={Boolean(errors.from)} />
          <FieldError message={errors.from} testID={`${prefix}-from-error`} />
        </View>
        <View style={styles.half} ref={anchor('to')}>
          <PickerField label="Last night" kind="date" value={values.toDate} onChange={(toDate) => onChange({ toDate })}
            testID={`${prefix}-to`} disabled={disabled} invalid={Boolean(errors.to)} />
          <FieldError message={errors.to} testID={`${prefix}-to-error`} />
        </View>
      </View>
      <View ref={anchor('hours')} style={styles.group}>
        <View style={styles.pair}>
          <View style={styles.half}>
            <PickerField label="Allowed from" kind="time" value={values.hoursStart} onChange={(hoursStart) => onChange({ hoursStart })}
              testID={`${prefix}-hours-start`} disabled={disabled} invalid={Boolean(errors.hours)} />
          </View>
          <View style={styles.half}>
            <PickerField label="Allowed until" kind="time" value={values.hoursEnd} onChange={(hoursEnd) => onChange({ hoursEnd })}
              testID={`${prefix}-hours-end`} disabled={disabled} invalid={Boolean(errors.hours)} />
          </View>
        </View>
        <Text style={styles.zone}>An end at or before the start runs past midnight (22:00 until 05:00); the same time twice allows the whole day.</Text>
        <FieldError message={errors.hours} testID={`${prefix}-hours-error`} />
      </View>
      <View ref={anchor('weekdays')} style={styles.group}>
        <Text style={styles.label}>Nights of the week (the day the allowed hours begin)</Text>
        <View style={styles.chips} role="group" aria-label="Nights of the week">
          {ALL_WEEKDAYS.map((day) => {
            const on = values.weekdays.includes(day);
            return (
              <Pressable key={day} role="checkbox" aria-checked={on} accessibilityLabel={WEEKDAY_NAMES[day]} disabled={disabled}
                onPress={() => toggleDay(day)} style={[styles.chip, on && styles.chipOn]} testID={`${prefix}-weekday-${day}`}>
                <Text style={[styles.chipText, on && styles.chipTextOn]}>{on ? '✓ ' : ''}{WEEKDAY_LABELS[day]}</Text>
              </Pressable>
            );
          })}
        </View>
        <FieldError message={errors.weekdays} testID={`${prefix}-weekdays-error`} />
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  group: { gap: space.sm },
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  half: { flexGrow: 1, flexBasis: 160, gap: space.xs },
  pickerField: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  zone: { ...type.caption, color: colors.inkMuted },
  row: { flexDirection: 'row', gap: space.xs, alignItems: 'stretch' },
  input: { flex: 1 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    minHeight: 44, minWidth: 52, justifyContent: 'center', alignItems: 'center', paddingHorizontal: space.md,
    borderRadius: radii.pill, borderWidth: 1.5, borderColor: colors.border, backgroundColor: colors.surface,
  },
  chipOn: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  chipText: { ...type.label, color: colors.ink },
  chipTextOn: { color: colors.primary },
  error: { ...type.caption, color: colors.danger },
});
