// The make-before-break order of the plan: each step sets up the new position before the old one is released.
// Knock-on moves come first (they free the room affected slices move into) and are marked with whom they serve.
import { StyleSheet, Text, View } from 'react-native';
import type { PlanReview, PlanStep } from '@/shared/plans';
import { madeRoomSentence } from '@/components/plans/plan-format';
import type { ElementNames } from '@/components/plans/use-element-names';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

type Props = { review: PlanReview; names: ElementNames; sliceName: (id: string) => string };

function where(value: PlanStep['from'], names: ElementNames): string {
  return Array.isArray(value) ? names.path(value) : names.site(value);
}

/**
 * "Move User plane of Tide gauges from Aldmouth to Brackwell"; "Reroute the link IoT gateway – User plane of Tide
 * gauges from Aldmouth → Corran to Aldmouth → Brackwell → Corran" — by names, never ids.
 */
export function stepText(step: PlanStep, names: ElementNames, sliceName: string): string {
  const what = step.kind === 'move-function' ? `Move ${names.fn(step.element)}` : `Reroute ${names.tie(step.element)}`;
  return `${what} of ${sliceName} from ${where(step.from, names)} to ${where(step.to, names)}`;
}

/** Step's slice id → why it moves, for knock-on steps: "Moved to make room for Harbour cranes". */
function knockOnReasons(review: PlanReview): Map<string, string> {
  return new Map(review.slices.filter((s) => s.madeRoomFor.length > 0)
    .map((s) => [s.slice, madeRoomSentence(s.outcome, s.madeRoomFor.map((m) => m.name))]));
}

export function PlanSteps({ review, names, sliceName }: Props) {
  if (review.steps.length === 0) return <Text style={styles.muted} testID="plan-steps-empty">Nothing has to move.</Text>;
  const reasons = knockOnReasons(review);
  const anyKnockOn = review.steps.some((s) => s.knockOn);
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
      {anyKnockOn ? (
        <Text style={styles.muted} testID="plan-steps-knock-on-note">
          Knock-on moves go first: they free the room the affected slices then move into.
        </Text>
      ) : null}
      {review.steps.map((step, i) => (
        <View key={`${step.slice}-${step.element}-${i}`} style={[styles.step, step.needsSpare && styles.spare]} testID={`plan-step-${i}`}>
          <Text style={styles.number}>{i + 1}</Text>
          <View style={styles.text}>
            <Text style={styles.body}>{stepText(step, names, sliceName(step.slice))}</Text>
            {step.knockOn ? (
              <Text style={styles.knockOn} testID={`plan-step-knock-on-${i}`}>
                Knock-on move · {reasons.get(step.slice) ?? 'Moved to make room for affected slices'}
              </Text>
            ) : null}
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
  knockOn: { ...type.label, color: colors.ink },
});
