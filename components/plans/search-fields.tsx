// The run form's search settings in planners' words: how hard to search, whether to use both processor cores, and a
// folded "Repeatable run" section holding the exact figures (plans weighed a round, run number) for a re-run.
import { useState } from 'react';
import { StyleSheet, Switch, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { TextField } from '@/components/text-field';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { BOTH_CORES_HINT, EFFORT, effortOf, SEARCH_EFFORTS, type SearchEffort } from '@/components/plans/plan-format';
import type { PlanFormErrors, PlanFormState } from '@/components/plans/plan-form-state';
import { colors, space, type } from '@/constants/theme';

type Props = {
  form: Pick<PlanFormState, 'mode' | 'population' | 'seed' | 'timeLimitSeconds'>;
  errors: PlanFormErrors;
  set: <K extends 'mode' | 'population' | 'seed' | 'timeLimitSeconds'>(key: K, value: PlanFormState[K]) => void;
};

const EFFORT_CHOICES = SEARCH_EFFORTS.map((e) => ({ value: e, label: EFFORT[e].label }));

export function SearchFields({ form, errors, set }: Props) {
  const effort = effortOf(Number(form.population));
  // Open from the start when the figures were set by hand, so nothing set is hidden.
  const [opened, setOpen] = useState(effort === null);
  // A complaint about a folded figure unfolds it, so the planner sees what to fix.
  const open = opened || Boolean(errors.population ?? errors.seed);
  const both = form.mode === 'islands';
  return (
    <View style={styles.box}>
      <Text style={styles.label}>Search effort</Text>
      <ChoiceChips
        label="Search effort" choices={EFFORT_CHOICES} value={effort ?? ''}
        onChange={(v) => v && set('population', String(EFFORT[v as SearchEffort].population))} testID="plan-form-effort"
      />
      <Text style={styles.hint} testID="plan-form-effort-hint">
        {effort ? EFFORT[effort].hint : `Set by hand: weighs ${form.population} plans a round (see Repeatable run).`}
      </Text>
      <View style={styles.row}>
        <Switch
          value={both} onValueChange={(on) => set('mode', on ? 'islands' : 'serial')}
          testID="plan-form-both-cores" accessibilityLabel="Use both processor cores"
        />
        <Text style={styles.body}>Use both processor cores</Text>
      </View>
      <Text style={styles.hint}>{BOTH_CORES_HINT}</Text>
      {errors.mode ? <Text style={styles.error}>{errors.mode}</Text> : null}
      <View style={styles.number}>
        <TextField
          label="Time limit (seconds)" value={form.timeLimitSeconds} onChangeText={(v) => set('timeLimitSeconds', v)}
          keyboardType="numeric" error={errors.timeLimitSeconds} testID="plan-form-time-limit"
        />
      </View>
      <Button
        label={open ? 'Repeatable run ▴' : 'Repeatable run ▾'} variant="quiet" onPress={() => setOpen((o) => !o)}
        testID="plan-form-repeatable-toggle"
      />
      {open ? (
        <View style={styles.box} testID="plan-form-repeatable">
          <Text style={styles.hint}>
            The same run number and settings give the same plan again, for checking a result or comparing one change.
          </Text>
          <View style={styles.numbers}>
            <View style={styles.number}>
              <TextField
                label="Plans weighed a round" value={form.population} onChangeText={(v) => set('population', v)}
                keyboardType="numeric" error={errors.population} testID="plan-form-population"
              />
            </View>
            <View style={styles.number}>
              <TextField
                label="Run number" value={form.seed} onChangeText={(v) => set('seed', v)}
                keyboardType="numeric" error={errors.seed} testID="plan-form-seed"
              />
            </View>
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { ...type.label, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  hint: { ...type.caption, color: colors.inkMuted },
  error: { ...type.caption, color: colors.danger },
  numbers: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  number: { flexGrow: 1, flexBasis: 100, maxWidth: 260 },
});
