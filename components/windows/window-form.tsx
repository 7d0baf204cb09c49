// The booking and editing form: checks what it can before sending, keeps every input when the server refuses.
import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Policies } from '@/shared/policies';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { zoneName } from '@/components/time';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { ElementSearch } from '@/components/windows/element-search';
import { FreezeNotice } from '@/components/windows/freeze-notice';
import { MopPicker } from '@/components/windows/mop-picker';
import type { MopFile } from '@/components/windows/mop-file';
import { PickedElements } from '@/components/windows/picked-elements';
import { TimeFields } from '@/components/windows/time-fields';
import {
  elementKey, OTHER_WORK_TYPE, validateWindowForm, WORK_TYPES,
  type FieldErrors, type WindowFormOutput, type WindowFormValues,
} from '@/components/windows/window-form-state';
import { saveErrorView } from '@/components/windows/window-save-errors';
import { colors, radii, space, type } from '@/constants/theme';

const WORK_TYPE_CHOICES = [...WORK_TYPES, OTHER_WORK_TYPE].map((value) => ({ value, label: value[0].toUpperCase() + value.slice(1) }));

export type WindowSubmission = { output: WindowFormOutput; freezeOverrideReason: string | null; mop: MopFile | null };

type Props = {
  initialValues: WindowFormValues;
  timeZone: string;
  policy: Pick<Policies, 'maxWindowHours' | 'bookingSkewMinutes'>;
  submitLabel: string;
  submitting: boolean;
  /** The last refusal from the server (the mutation's error); cleared when the next save starts. */
  saveError: unknown;
  canOverrideFreeze: boolean;
  storedMopName?: string | null;
  onSubmit: (submission: WindowSubmission) => void;
  onCancel: () => void;
  /** Shown above the buttons, e.g. the stale-version notice with its Reload button. */
  notice?: ReactNode;
  now?: () => Date;
};

export function WindowForm(props: Props) {
  const { timeZone, submitting: busy } = props;
  const [values, setValues] = useState(props.initialValues);
  const [mop, setMop] = useState<MopFile | null>(null);
  const [overrideReason, setOverrideReason] = useState('');
  const [clientErrors, setClientErrors] = useState<FieldErrors>({});
  // Stays open after the refusal so the admin's reason is not lost between attempts.
  const [freezeMessage, setFreezeMessage] = useState<string | null>(null);
  const server = saveErrorView(props.saveError);
  if (server.freeze && server.freeze !== freezeMessage) setFreezeMessage(server.freeze);
  const errors: FieldErrors = { ...server.fieldErrors, ...clientErrors };
  const set = (patch: Partial<WindowFormValues>) => setValues((current) => ({ ...current, ...patch }));

  const submit = () => {
    if (busy) return;
    const { errors: found, output } = validateWindowForm(values, { timeZone, now: (props.now ?? (() => new Date()))(), policy: props.policy });
    const reason = overrideReason.trim();
    if (freezeMessage && props.canOverrideFreeze && !reason) found.overrideReason = 'Write why this work must happen inside the freeze.';
    setClientErrors(found);
    if (!output || found.overrideReason) return;
    props.onSubmit({ output, freezeOverrideReason: freezeMessage && reason ? reason : null, mop });
  };

  return (
    <View style={styles.form} role="form" aria-label={props.submitLabel}>
      {server.banner ? <Text style={styles.banner} role="alert" testID="window-save-error">{server.banner}</Text> : null}
      <TextField label="Title" testID="window-title" value={values.title} onChangeText={(title) => set({ title })} error={errors.title} editable={!busy} />
      <Text style={styles.zone} testID="window-zone">Times are in {timeZone} ({zoneName(new Date(), timeZone)}).</Text>
      <TimeFields label="Starts" testID="window-start" date={values.startDate} time={values.startTime} error={errors.start} disabled={busy}
        onChange={({ date, time }) => set({ startDate: date, startTime: time, ...(values.endDate ? {} : { endDate: date }) })} />
      <TimeFields label="Ends" testID="window-end" date={values.endDate} time={values.endTime} error={errors.end} disabled={busy}
        onChange={({ date, time }) => set({ endDate: date, endTime: time })} />
      <View style={styles.group}>
        <Text style={styles.label}>Work type</Text>
        <ChoiceChips label="Work type" choices={WORK_TYPE_CHOICES} value={values.workType} onChange={(workType) => set({ workType })} testID="window-work-type" disabled={busy} />
        {values.workType === OTHER_WORK_TYPE ? (
          <TextField label="What kind of work" testID="window-work-type-other" value={values.otherWorkType} onChangeText={(otherWorkType) => set({ otherWorkType })} error={errors.workType} editable={!busy} />
        ) : null}
      </View>
      <View style={styles.group}>
        <Text style={styles.label}>Sites and spans taken out</Text>
        {errors.elements ? <Text style={styles.error} role="alert" testID="window-elements-error">{errors.elements}</Text> : null}
        <PickedElements elements={values.elements} onChange={(elements) => set({ elements })} fractionErrors={clientErrors.elementFraction} disabled={busy} />
        <ElementSearch
          pickedKeys={new Set(values.elements.map(elementKey))}
          disabled={busy}
          onPick={(o) => set({ elements: [...values.elements, { kind: o.kind, id: o.id, label: o.label, effect: 'down', percentText: '' }] })}
        />
      </View>
      <TextField label="Notes" testID="window-notes" value={values.notes} onChangeText={(notes) => set({ notes })} error={errors.notes} multiline numberOfLines={4} editable={!busy} />
      <MopPicker file={mop} onChange={setMop} storedName={props.storedMopName} disabled={busy} />
      {freezeMessage ? (
        <FreezeNotice message={freezeMessage} canOverride={props.canOverrideFreeze} reason={overrideReason} onReasonChange={setOverrideReason} reasonError={errors.overrideReason} disabled={busy} />
      ) : null}
      {props.notice}
      <View style={styles.actions}>
        <Button label={busy ? 'Saving…' : props.submitLabel} onPress={submit} busy={busy} testID="window-submit" />
        <Button label="Cancel" variant="quiet" onPress={props.onCancel} disabled={busy} testID="window-cancel" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  group: { gap: space.sm },
  label: { ...type.label, color: colors.ink },
  zone: { ...type.caption, color: colors.inkMuted },
  error: { ...type.caption, color: colors.danger },
  banner: { ...type.bodyStrong, color: colors.danger, backgroundColor: colors.dangerSoft, padding: space.md, borderRadius: radii.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
