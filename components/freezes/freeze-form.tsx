// Create or edit a freeze (admins): title, start and end as local date and time (typed or picked), and a reason.
// What blocks saving is listed beside the save button, and each error goes as soon as its field is fixed.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { FormErrorSummary, useFieldAnchors } from '@/components/form-error-summary';
import { TextField } from '@/components/text-field';
import { timesInLabel } from '@/components/time';
import { TimeFields } from '@/components/windows/time-fields';
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

type FreezeField = keyof FreezeDraftErrors;
const LABELS: Record<FreezeField, string> = { title: 'Title', start: 'Starts', end: 'Ends' };

export function FreezeForm({ initial, heading, timeZone, busy, serverError, onSubmit, onCancel }: Props) {
  const [draft, setDraft] = useState(initial);
  // After the first attempt the checks run on every change, so a fixed field loses its error at once.
  const [attempted, setAttempted] = useState(false);
  const { anchor, reveal } = useFieldAnchors<FreezeField>();
  const result = validateFreezeDraft(draft, timeZone);
  const errors: FreezeDraftErrors = attempted && !result.ok ? result.errors : {};
  const set = (patch: Partial<FreezeDraft>) => setDraft((d) => ({ ...d, ...patch }));
  const submit = () => {
    setAttempted(true);
    if (result.ok) onSubmit(result.value);
  };
  const summary = (Object.keys(LABELS) as FreezeField[]).filter((key) => errors[key])
    .map((key) => ({ key, label: LABELS[key], message: errors[key] as string }));
  return (
    <View style={styles.panel} testID="freeze-form">
      <Text style={styles.heading} role="heading" aria-level={2}>
        {heading}
      </Text>
      <Text style={styles.zone}>{timesInLabel(timeZone)}</Text>
      <View ref={anchor('title')}>
        <TextField label="Title" value={draft.title} onChangeText={(title) => set({ title })} error={errors.title} testID="freeze-title" />
      </View>
      <View ref={anchor('start')}>
        <TimeFields label="Starts" testID="freeze-start" pickerName="freeze-start" timeZone={timeZone} date={draft.startDate} time={draft.startTime}
          error={errors.start} onChange={({ date, time }) => set({ startDate: date, startTime: time })} />
      </View>
      <View ref={anchor('end')}>
        <TimeFields label="Ends" testID="freeze-end" pickerName="freeze-end" timeZone={timeZone} date={draft.endDate} time={draft.endTime}
          error={errors.end} onChange={({ date, time }) => set({ endDate: date, endTime: time })} />
      </View>
      <TextField label="Reason (optional)" value={draft.reason} onChangeText={(reason) => set({ reason })} multiline numberOfLines={3} testID="freeze-reason" />
      {serverError ? (
        <Text style={styles.serverError} role="alert" testID="freeze-server-error">
          {serverError}
        </Text>
      ) : null}
      <FormErrorSummary errors={summary} onSelect={reveal} />
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
  serverError: { ...type.body, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
  actions: { flexDirection: 'row', justifyContent: 'flex-end', gap: space.sm },
});
