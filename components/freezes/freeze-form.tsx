// Create or edit a freeze (admins): title, start and end as local date and time, and a reason.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { timesInLabel } from '@/components/time';
import { colors, radii, space, type } from '@/constants/theme';
import { validateFreezeDraft, type FreezeDraft, type FreezeDraftErrors } from './freeze-form-state';
import type { FreezeCreate } from '@/shared/freezes';

type Props = {
  initial: FreezeDraft;
  heading: string;
  timeZone: string;
  busy: boolean;
  serverError?: string;
  onSubmit: (value: FreezeCreate) => void;
  onCancel: () => void;
};

export function FreezeForm({ initial, heading, timeZone, busy, serverError, onSubmit, onCancel }: Props) {
  const [draft, setDraft] = useState(initial);
  const [errors, setErrors] = useState<FreezeDraftErrors>({});
  const set = (field: keyof FreezeDraft) => (text: string) => setDraft((d) => ({ ...d, [field]: text }));
  const submit = () => {
    const result = validateFreezeDraft(draft, timeZone);
    if (!result.ok) return setErrors(result.errors);
    setErrors({});
    onSubmit(result.value);
  };
  return (
    <View style={styles.panel} testID="freeze-form">
      <Text style={styles.heading} role="heading">
        {heading}
      </Text>
      <Text style={styles.zone}>{timesInLabel(timeZone)}</Text>
      <TextField label="Title" value={draft.title} onChangeText={set('title')} error={errors.title} testID="freeze-title" />
      <View style={styles.pair}>
        <View style={styles.date}>
          <TextField label="Starts (date)" placeholder="YYYY-MM-DD" value={draft.startDate} onChangeText={set('startDate')} error={errors.start} testID="freeze-start-date" />
        </View>
        <View style={styles.time}>
          <TextField label="Time" placeholder="HH:MM" value={draft.startTime} onChangeText={set('startTime')} testID="freeze-start-time" />
        </View>
      </View>
      <View style={styles.pair}>
        <View style={styles.date}>
          <TextField label="Ends (date)" placeholder="YYYY-MM-DD" value={draft.endDate} onChangeText={set('endDate')} error={errors.end} testID="freeze-end-date" />
        </View>
        <View style={styles.time}>
          <TextField label="Time" placeholder="HH:MM" value={draft.endTime} onChangeText={set('endTime')} testID="freeze-end-time" />
        </View>
      </View>
      <TextField label="Reason (optional)" value={draft.reason} onChangeText={set('reason')} multiline numberOfLines={3} testID="freeze-reason" />
      {serverError ? (
        <Text style={styles.serverError} role="alert" testID="freeze-server-error">
          {serverError}
        </Text>
      ) : null}
      <View style={styles.actions}>
        <Button label="Cancel" variant="quiet" onPress={onCancel} testID="freeze-cancel" />
        <Button label="Save freeze" onPress={submit} busy={busy} testID="freeze-save" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, padding: space.lg, gap: space.md },
  heading: { ...type.heading, color: colors.ink },
  zone: { ...type.caption, color: colors.inkMuted, marginTop: -space.sm },
  pair: { flexDirection: 'row', gap: space.sm },
  date: { flex: 3 },
  time: { flex: 2 },
  serverError: { ...type.body, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm },
});
