// The booking and editing form: checks what it can before sending, keeps every input when the server refuses,
// lists what blocks saving beside the submit button, and drops each error as soon as its field is fixed.
import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Policies } from '@/shared/policies';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { FormErrorSummary, useFieldAnchors, type SummaryError } from '@/components/form-error-summary';
import { timesInLabel } from '@/components/time';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { ElementSearch } from '@/components/windows/element-search';
import { FreezeNotice } from '@/components/windows/freeze-notice';
import { MopPicker } from '@/components/windows/mop-picker';
import type { MopFile } from '@/components/windows/mop-file';
import { PickedElements } from '@/components/windows/picked-elements';
import { TimeFields } from '@/components/windows/time-fields';
import {
  elementKey, OTHER_WORK_TYPE, validateWindowForm, WORK_TYPES,
  type FieldErrors, type FieldKey, type WindowFormOutput, type WindowFormValues,
} from '@/components/windows/window-form-state';
import { saveErrorView } from '@/components/windows/window-save-errors';
import { TimeChangeWarning, timesChanged, type WallTimes } from '@/components/windows/window-time-change';
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
  /** The stored times of a window whose tenants were told them: changing them warns before saving. */
  notifiedTimes?: WallTimes;
};

const FIELD_LABELS: Record<FieldKey, string> = {
  title: 'Title', start: 'Starts', end: 'Ends', workType: 'Work type', elements: 'Sites and spans', notes: 'Notes',
  overrideReason: 'Reason for booking inside the freeze',
};

/** Which error a changed value can fix: a server error on that field stops showing once it changes. */
const FIELD_OF_VALUE: Record<keyof WindowFormValues, FieldKey> = {
  title: 'title', startDate: 'start', startTime: 'start', endDate: 'end', endTime: 'end',
  workType: 'workType', otherWorkType: 'workType', elements: 'elements', notes: 'notes',
};

function summaryOf(errors: FieldErrors): SummaryError<FieldKey>[] {
  const list = (Object.keys(FIELD_LABELS) as FieldKey[])
    .filter((key) => errors[key])
    .map((key) => ({ key, label: FIELD_LABELS[key], message: errors[key] as string }));
  const fraction = Object.values(errors.elementFraction ?? {})[0];
  if (fraction && !errors.elements) list.push({ key: 'elements', label: FIELD_LABELS.elements, message: fraction });
  return list;
}

export function WindowForm(props: Props) {
  const { timeZone, submitting: busy } = props;
  const [values, setValues] = useState(props.initialValues);
  const [mop, setMop] = useState<MopFile | null>(null);
  const [overrideReason, setOverrideReason] = useState('');
  // After the first attempt the checks run on every change, so a fixed field loses its error at once.
  const [attempted, setAttempted] = useState(false);
  // Stays open after the refusal so the admin's reason is not lost between attempts.
  const [freezeMessage, setFreezeMessage] = useState<string | null>(null);
  // Fields changed since the server's last refusal: its words on them are out of date.
  const [changedSinceRefusal, setChangedSinceRefusal] = useState<{ error: unknown; fields: ReadonlySet<FieldKey> }>({ error: null, fields: new Set() });
  const { anchor, reveal } = useFieldAnchors<FieldKey>();
  const server = saveErrorView(props.saveError);
  if (server.freeze && server.freeze !== freezeMessage) setFreezeMessage(server.freeze);
  if (changedSinceRefusal.error !== props.saveError) setChangedSinceRefusal({ error: props.saveError, fields: new Set() });

  const check = () => {
    const result = validateWindowForm(values, { timeZone, now: (props.now ?? (() => new Date()))(), policy: props.policy });
    if (freezeMessage && props.canOverrideFreeze && !overrideReason.trim()) result.errors.overrideReason = 'Write why this work must happen inside the freeze.';
    return result;
  };
  const clientErrors: FieldErrors = attempted ? check().errors : {};
  const serverErrors = Object.fromEntries(Object.entries(server.fieldErrors).filter(([key]) => !changedSinceRefusal.fields.has(key as FieldKey)));
  const errors: FieldErrors = { ...serverErrors, ...clientErrors };
  const set = (patch: Partial<WindowFormValues>) => {
    setValues((current) => ({ ...current, ...patch }));
    const touched = (Object.keys(patch) as (keyof WindowFormValues)[]).map((key) => FIELD_OF_VALUE[key]);
    setChangedSinceRefusal((current) => ({ ...current, fields: new Set([...current.fields, ...touched]) }));
  };

  const submit = () => {
    if (busy) return;
    setAttempted(true);
    const { errors: found, output } = check();
    if (!output || found.overrideReason) return;
    const reason = overrideReason.trim();
    props.onSubmit({ output, freezeOverrideReason: freezeMessage && reason ? reason : null, mop });
  };

  return (
    <View style={styles.form} role="form" aria-label={props.submitLabel}>
      <View ref={anchor('title')}>
        <TextField label="Title" testID="window-title" value={values.title} onChangeText={(title) => set({ title })} error={errors.title} editable={!busy} />
      </View>
      <Text style={styles.zone} testID="window-zone">{timesInLabel(timeZone)}. Type or pick the times as clocks there show them.</Text>
      <View ref={anchor('start')}>
        <TimeFields label="Starts" testID="window-start" pickerName="start" timeZone={timeZone} date={values.startDate} time={values.startTime} error={errors.start} disabled={busy}
          onChange={({ date, time }) => set({ startDate: date, startTime: time, ...(values.endDate ? {} : { endDate: date }) })} />
      </View>
      <View ref={anchor('end')}>
        <TimeFields label="Ends" testID="window-end" pickerName="end" timeZone={timeZone} date={values.endDate} time={values.endTime} error={errors.end} disabled={busy}
          onChange={({ date, time }) => set({ endDate: date, endTime: time })} />
      </View>
      <View style={styles.group} ref={anchor('workType')}>
        <Text style={styles.label}>Work type</Text>
        <ChoiceChips label="Work type" choices={WORK_TYPE_CHOICES} value={values.workType} onChange={(workType) => set({ workType })} testID="window-work-type" disabled={busy} />
        {values.workType === OTHER_WORK_TYPE ? (
          <TextField label="What kind of work" testID="window-work-type-other" value={values.otherWorkType} onChangeText={(otherWorkType) => set({ otherWorkType })} error={errors.workType} editable={!busy} />
        ) : null}
      </View>
      <View style={styles.group} ref={anchor('elements')}>
        <Text style={styles.label}>Sites and spans taken out</Text>
        {errors.elements ? <Text style={styles.error} role="alert" testID="window-elements-error">{errors.elements}</Text> : null}
        <PickedElements elements={values.elements} onChange={(elements) => set({ elements })} fractionErrors={errors.elementFraction} disabled={busy} />
        <ElementSearch
          pickedKeys={new Set(values.elements.map(elementKey))}
          disabled={busy}
          onPick={(o) => set({ elements: [...values.elements, { kind: o.kind, id: o.id, label: o.label, detail: o.detail, effect: 'down', percentText: '' }] })}
        />
      </View>
      <View ref={anchor('notes')}>
        <TextField label="Notes" testID="window-notes" value={values.notes} onChangeText={(notes) => set({ notes })} error={errors.notes} multiline numberOfLines={4} editable={!busy} />
      </View>
      <MopPicker file={mop} onChange={setMop} storedName={props.storedMopName} disabled={busy} />
      {freezeMessage ? (
        <View ref={anchor('overrideReason')}>
          <FreezeNotice message={freezeMessage} canOverride={props.canOverrideFreeze} reason={overrideReason} onReasonChange={setOverrideReason}
            reasonError={errors.overrideReason} disabled={busy} />
        </View>
      ) : null}
      {props.notifiedTimes && timesChanged(props.notifiedTimes, values) ? <TimeChangeWarning /> : null}
      {props.notice}
      {server.banner ? <Text style={styles.banner} role="alert" testID="window-save-error">{server.banner}</Text> : null}
      <FormErrorSummary errors={summaryOf(errors)} onSelect={reveal} />
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
