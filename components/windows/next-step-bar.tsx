// "Next: …" — the one filled button on a window's screens, named for the next step, with one line on why.
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import type { NextStep } from '@/components/windows/next-step';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  step: NextStep;
  /** false when the step's button would lead to the screen the viewer is on (the step is right below) */
  showButton: boolean;
  busy: boolean;
  error: string | null;
  /** a line after the step was taken, e.g. who was e-mailed */
  done: string | null;
  onAct: () => void;
};

export function NextStepBar({ step, showButton, busy, error, done, onAct }: Props) {
  const button = showButton && step.action !== null;
  return (
    <View style={styles.bar} testID="next-step" accessibilityLabel={`Next step: ${step.label}`}>
      <View style={styles.row}>
        <Text style={styles.label}>Next: {step.label}</Text>
        {button ? <Button label={step.label} onPress={onAct} busy={busy} testID="next-step-action" /> : null}
      </View>
      <Text style={styles.why} testID="next-step-why">{step.why}</Text>
      {done ? <Text style={styles.done} testID="next-step-done">{done}</Text> : null}
      {error ? <Text style={styles.error} role="alert" testID="next-step-error">{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.xs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.primarySoft },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  label: { ...type.bodyStrong, color: colors.abyss },
  why: { ...type.body, color: colors.ink },
  done: { ...type.bodyStrong, color: colors.primary },
  error: { ...type.bodyStrong, color: colors.danger },
});
