// The slot finder's question: which sites and spans, how long, which nights and hours. Checks what it can before
// sending, lists what blocks the search beside its button, and drops each error once its field is fixed.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { SlotSearchCreate } from '@/shared/slots';
import { Button } from '@/components/button';
import { FormErrorSummary, useFieldAnchors, type SummaryError } from '@/components/form-error-summary';
import { colors, radii, space, type } from '@/constants/theme';
import { SlotElementPicker } from './element-picker';
import { validateSlotForm, type SlotFormErrors, type SlotFormValues } from './slot-form-state';
import { TimingFields } from './timing-fields';
import type { TimingValues } from './timing-form-state';

type FieldKey = keyof SlotFormErrors;

const FIELD_LABELS: Record<FieldKey, string> = {
  elements: 'Sites and spans', duration: 'Hours of work', from: 'First night', to: 'Last night', hours: 'Allowed hours', weekdays: 'Nights of the week',
};

export function summaryOf(errors: SlotFormErrors): SummaryError<FieldKey>[] {
  return (Object.keys(FIELD_LABELS) as FieldKey[])
    .filter((key) => errors[key])
    .map((key) => ({ key, label: FIELD_LABELS[key], message: errors[key] as string }));
}

type Props = {
  initialValues: SlotFormValues;
  submitting: boolean;
  /** the server's refusal of the last search, in its words */
  submitError: string | null;
  onSubmit: (request: SlotSearchCreate, values: SlotFormValues) => void;
};

export function SlotForm({ initialValues, submitting: busy, submitError, onSubmit }: Props) {
  const [values, setValues] = useState(initialValues);
  const [attempted, setAttempted] = useState(false);
  const { anchor, reveal } = useFieldAnchors<FieldKey>();
  const errors: SlotFormErrors = attempted ? validateSlotForm(values).errors : {};
  const set = (patch: Partial<SlotFormValues>) => setValues((current) => ({ ...current, ...patch }));
  const submit = () => {
    if (busy) return;
    setAttempted(true);
    const { output } = validateSlotForm(values);
    if (output) onSubmit(output, values);
  };
  return (
    <View style={styles.form} role="form" aria-label="Find a slot" testID="slot-form">
      <View style={styles.group} ref={anchor('elements')}>
        <Text style={styles.label}>Sites and spans the work takes out</Text>
        {errors.elements ? <Text style={styles.error} role="alert" testID="slot-elements-error">{errors.elements}</Text> : null}
        <SlotElementPicker elements={values.elements} onChange={(elements) => set({ elements })} disabled={busy} testID="slot-elements" />
      </View>
      <TimingFields values={values} onChange={(patch: Partial<TimingValues>) => set(patch)} errors={errors} disabled={busy} prefix="slot" anchor={anchor} />
      {submitError ? <Text style={styles.banner} role="alert" testID="slot-submit-error">{submitError}</Text> : null}
      <FormErrorSummary errors={summaryOf(errors)} onSelect={reveal} testID="slot-form-errors" />
      <View style={styles.actions}>
        <Button label={busy ? 'Starting…' : 'Find slots'} onPress={submit} busy={busy} testID="slot-submit" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  group: { gap: space.sm },
  label: { ...type.label, color: colors.ink },
  error: { ...type.caption, color: colors.danger },
  banner: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
