// The "new run" form: how the re-mapper searches, what happens after the window, whether it may move untouched
// slices to make room, and what it must not touch.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { PlanSettings } from '@/shared/plans';
import { usePlanRunMutation } from '@/hooks/queries/plans';
import { Button } from '@/components/button';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { KnockOnFields } from '@/components/plans/knock-on-fields';
import { PickChips, type PickOption } from '@/components/plans/pick-chips';
import { SearchFields } from '@/components/plans/search-fields';
import type { RunOptions } from '@/components/plans/use-run-options';
import {
  errorsFromApi, formFromSettings, settingsFromForm, type PlanFormErrors, type PlanFormState,
} from '@/components/plans/plan-form-state';
import { colors, space, type } from '@/constants/theme';

type Props = {
  windowId: string;
  /** pre-filled from an earlier run ("Adjust and re-run"); the contract's defaults otherwise */
  initial?: PlanSettings;
  functionOptions: readonly PickOption[];
  siteOptions: readonly PickOption[];
  loading?: Pick<RunOptions, 'loadingFunctions' | 'loadingSites'>;
  onQueued: (planId: string) => void;
  onClose?: () => void;
};

const AFTER = [
  { value: 'return', label: 'Move back afterwards' },
  { value: 'keep', label: 'Keep the new places' },
] as const;
const PICKS = [
  {
    key: 'pinned', label: 'Keep where they are', loading: 'loadingFunctions', testID: 'plan-form-pinned',
    hint: 'Functions that must stay on their current site; their slices can only be rerouted.',
  },
  {
    key: 'excludedSites', label: 'Sites to leave out', loading: 'loadingSites', testID: 'plan-form-excluded',
    hint: 'No function will be moved onto these sites.',
  },
] as const;

export function PlanRunForm({ windowId, initial, functionOptions, siteOptions, loading, onQueued, onClose }: Props) {
  const [form, setForm] = useState<PlanFormState>(() => formFromSettings(initial));
  const [localErrors, setLocalErrors] = useState<PlanFormErrors>({});
  const run = usePlanRunMutation(windowId);
  const errors: PlanFormErrors = { ...errorsFromApi(run.error), ...localErrors };
  const set = <K extends keyof PlanFormState>(key: K, value: PlanFormState[K]) => {
    setForm((f) => ({ ...f, [key]: value }));
    setLocalErrors((e) => ({ ...e, [key]: undefined }));
  };
  const submit = () => {
    const parsed = settingsFromForm(form);
    if ('errors' in parsed) return setLocalErrors(parsed.errors);
    setLocalErrors({});
    run.mutate(parsed.settings, { onSuccess: ({ plan }) => onQueued(plan.id) });
  };
  return (
    <View style={styles.form} testID="plan-form">
      <SearchFields form={form} errors={errors} set={set} />
      <Text style={styles.label}>After the window</Text>
      <ChoiceChips label="After the window" choices={AFTER} value={form.afterWindow} onChange={(v) => v && set('afterWindow', v as PlanFormState['afterWindow'])} testID="plan-form-after" />
      <KnockOnFields
        on={form.knockOn} max={form.maxKnockOnMoves} error={errors.maxKnockOnMoves ?? errors.knockOn}
        onToggle={(v) => set('knockOn', v)} onMax={(v) => set('maxKnockOnMoves', v)}
      />
      {PICKS.map((p) => (
        <PickChips
          key={p.key}
          label={p.label}
          hint={p.hint}
          options={p.key === 'pinned' ? functionOptions : siteOptions}
          picked={form[p.key]}
          onChange={(v) => set(p.key, v)}
          error={errors[p.key]}
          loading={loading?.[p.loading]}
          testID={p.testID}
        />
      ))}
      {errors.form ? <Text style={styles.error} role="alert" testID="plan-form-error">{errors.form}</Text> : null}
      <View style={styles.actions}>
        <Button label="Start run" onPress={submit} busy={run.isPending} testID="plan-form-submit" />
        {onClose ? <Button label="Close" variant="quiet" onPress={onClose} testID="plan-form-close" /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  label: { ...type.label, color: colors.ink },
  error: { ...type.caption, color: colors.danger },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
