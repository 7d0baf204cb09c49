// The new-campaign form: title, element groups (add a row per window: its name and its sites and spans), the
// timing, and the campaign's two rules. Lists what blocks the run beside its button.
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { CampaignCreate } from '@/shared/slots';
import { Button } from '@/components/button';
import { FormErrorSummary, useFieldAnchors, type SummaryError } from '@/components/form-error-summary';
import { TextField } from '@/components/text-field';
import { SlotElementPicker } from '@/components/slots/element-picker';
import { TimingFields } from '@/components/slots/timing-fields';
import type { TimingValues } from '@/components/slots/timing-form-state';
import { colors, radii, space, type } from '@/constants/theme';
import { newGroup, validateCampaignForm, type CampaignFormErrors, type CampaignFormValues, type CampaignGroupValues } from './campaign-form-state';

type FieldKey = Exclude<keyof CampaignFormErrors, 'group'>;

const FIELD_LABELS: Record<FieldKey, string> = {
  title: 'Title', groups: 'Groups', duration: 'Hours of work', from: 'First night', to: 'Last night', hours: 'Allowed hours',
  weekdays: 'Nights of the week', maxPerNight: 'Windows a night', minDays: 'Days between touches',
};

function summaryOf(errors: CampaignFormErrors): SummaryError<FieldKey>[] {
  return (Object.keys(FIELD_LABELS) as FieldKey[])
    .filter((key) => errors[key])
    .map((key) => ({ key, label: FIELD_LABELS[key], message: errors[key] as string }));
}

type Props = {
  initialValues: CampaignFormValues;
  submitting: boolean;
  submitError: string | null;
  onSubmit: (request: CampaignCreate) => void;
  onCancel: () => void;
};

export function CampaignForm({ initialValues, submitting: busy, submitError, onSubmit, onCancel }: Props) {
  const [values, setValues] = useState(initialValues);
  const [attempted, setAttempted] = useState(false);
  const { anchor, reveal } = useFieldAnchors<FieldKey>();
  const errors: CampaignFormErrors = attempted ? validateCampaignForm(values).errors : {};
  const set = (patch: Partial<CampaignFormValues>) => setValues((current) => ({ ...current, ...patch }));
  const setGroup = (key: string, patch: Partial<CampaignGroupValues>) =>
    set({ groups: values.groups.map((g) => (g.key === key ? { ...g, ...patch } : g)) });
  const submit = () => {
    if (busy) return;
    setAttempted(true);
    const { output } = validateCampaignForm(values);
    if (output) onSubmit(output);
  };
  return (
    <View style={styles.form} role="form" aria-label="New campaign" testID="campaign-form">
      <View ref={anchor('title')}>
        <TextField label="Title" testID="campaign-title" value={values.title} onChangeText={(title) => set({ title })} error={errors.title} editable={!busy}
          placeholder="e.g. Software upgrade, northern sites" />
      </View>
      <View style={styles.group} ref={anchor('groups')}>
        <Text style={styles.label} role="heading" aria-level={2}>Groups: one window each</Text>
        {errors.groups ? <Text style={styles.error} role="alert" testID="campaign-groups-error">{errors.groups}</Text> : null}
        {values.groups.map((g, i) => (
          <View key={g.key} style={styles.groupCard} testID={`campaign-group-${i}`}>
            <View style={styles.groupHead}>
              <View style={styles.grow}>
                <TextField label={`Group ${i + 1} name`} testID={`campaign-group-${i}-label`} value={g.label} editable={!busy}
                  onChangeText={(label) => setGroup(g.key, { label })} error={errors.group?.[g.key]} />
              </View>
              {values.groups.length > 1 ? (
                <Pressable role="button" accessibilityLabel={`Remove group ${i + 1}`} disabled={busy} style={styles.remove}
                  onPress={() => set({ groups: values.groups.filter((x) => x.key !== g.key) })} testID={`campaign-group-${i}-remove`}>
                  <Text style={styles.removeText}>Remove</Text>
                </Pressable>
              ) : null}
            </View>
            <SlotElementPicker elements={g.elements} onChange={(elements) => setGroup(g.key, { elements })} disabled={busy} testID={`campaign-group-${i}-elements`} />
          </View>
        ))}
        <View style={styles.actions}>
          <Button label="Add a group" variant="quiet" onPress={() => set({ groups: [...values.groups, newGroup()] })} disabled={busy} testID="campaign-group-add" />
        </View>
      </View>
      <TimingFields values={values} onChange={(patch: Partial<TimingValues>) => set(patch)} errors={errors} disabled={busy} prefix="campaign" anchor={anchor} />
      <View ref={anchor('maxPerNight')}>
        <TextField label="At most this many windows a night" testID="campaign-max-per-night" value={values.maxPerNightText} inputMode="numeric"
          onChangeText={(maxPerNightText) => set({ maxPerNightText })} error={errors.maxPerNight} editable={!busy} />
      </View>
      <View ref={anchor('minDays')}>
        <TextField label="A slice is touched at most once in this many days (0 for no limit)" testID="campaign-min-days" value={values.minDaysText}
          inputMode="numeric" onChangeText={(minDaysText) => set({ minDaysText })} error={errors.minDays} editable={!busy} />
      </View>
      {submitError ? <Text style={styles.banner} role="alert" testID="campaign-submit-error">{submitError}</Text> : null}
      <FormErrorSummary errors={summaryOf(errors)} onSelect={reveal} testID="campaign-form-errors" />
      <View style={styles.actions}>
        <Button label={busy ? 'Starting…' : 'Schedule the campaign'} onPress={submit} busy={busy} testID="campaign-submit" />
        <Button label="Cancel" variant="quiet" onPress={onCancel} disabled={busy} testID="campaign-cancel" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  group: { gap: space.sm },
  groupCard: { gap: space.sm, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  groupHead: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  grow: { flex: 1 },
  label: { ...type.heading, color: colors.ink },
  error: { ...type.caption, color: colors.danger },
  remove: { paddingHorizontal: space.sm, minHeight: 44, justifyContent: 'center', marginTop: space.lg },
  removeText: { ...type.label, color: colors.danger },
  banner: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
