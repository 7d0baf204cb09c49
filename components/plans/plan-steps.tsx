// The make-before-break order of the plan: each step sets up the new position before the old one is released.
import { StyleSheet, Text, View } from 'react-native';
import type { PlanReview, PlanStep } from '@/shared/plans';
import type { ElementNames } from '@/components/plans/use-element-names';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

type Props = { review: PlanReview; names: ElementNames; sliceName: (id: string) => string };

function where(value: PlanStep['from'], names: ElementNames): string {
  return Array.isArray(value) ? names.path(value) : names.site(value);
}

export function stepText(step: PlanStep, names: ElementNames): string {
  const verb = step.kind === 'move-function' ? 'Move function' : 'Reroute link';
  return `${verb} ${step.element}: ${where(step.from, names)} → ${where(step.to, names)}`;
}

export function PlanSteps({ review, names, sliceName }: Props) {
  if (review.steps.length === 0) return <Text style={styles.muted} testID="plan-steps-empty">Nothing has to move.</Text>;
  return (
    <View style={styles.list} testID="plan-steps">
      {review.needsSpare > 0 ? (
        <Text style={styles.warning} testID="plan-steps-spare-count">
          {review.needsSpare} {review.needsSpare === 1 ? 'step needs' : 'steps need'} temporary spare capacity: the old and new
          positions do not both fit at that point.
        </Text>
      ) : (
        <Text style={styles.muted}>Every step fits with the old and new positions held at once.</Text>
      )}
      {review.steps.map((step, i) => (
        <View key={`${step.slice}-${step.element}-${i}`} style={[styles.step, step.needsSpare && styles.spare]} testID={`plan-step-${i}`}>
          <Text style={styles.number}>{i + 1}</Text>
          <View style={styles.text}>
            <Text style={styles.body}>{stepText(step, names)}</Text>
            <Text style={styles.muted}>{sliceName(step.slice)}</Text>
            {step.needsSpare ? <Text style={styles.flag} testID={`plan-step-spare-${i}`}>Needs spare capacity</Text> : null}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  step: { flexDirection: 'row', gap: space.md, padding: space.sm, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border },
  spare: { borderColor: calendarColors.critical, borderWidth: 2, backgroundColor: calendarColors.criticalSoft },
  number: { ...type.heading, color: colors.inkMuted, minWidth: 24, textAlign: 'right' },
  text: { flex: 1, gap: space.xxs },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  warning: { ...type.bodyStrong, color: calendarColors.critical },
  flag: { ...type.label, color: calendarColors.critical },
});
