// Accept this run as the window's plan (once every outage is a conscious choice), or adjust the settings and run again.
import { StyleSheet, Text, View } from 'react-native';
import type { Plan, PlanReview } from '@/shared/plans';
import { usePlanAcceptMutation } from '@/hooks/queries/plans';
import { Button } from '@/components/button';
import { outagesAllTicked, unresolvedSlices } from '@/components/plans/plan-review-data';
import { colors, space, type } from '@/constants/theme';

type Props = { plan: Plan; review: PlanReview; canAct: boolean; ticked: readonly string[]; onAdjust: () => void };

function acceptHint(plan: Plan, review: PlanReview, ticked: readonly string[]): string | null {
  if (plan.stale) return 'The window changed after this run, so it can no longer be accepted. Adjust and run again.';
  const open = unresolvedSlices(review).filter((s) => !ticked.includes(s.slice)).length;
  if (open > 0) return `Tick the outage of ${open === 1 ? 'the unresolved slice' : `all ${open} unresolved slices`} above to accept this plan.`;
  return null;
}

export function PlanAcceptBar({ plan, review, canAct, ticked, onAdjust }: Props) {
  const accept = usePlanAcceptMutation(plan.windowId);
  if (plan.accepted) {
    return (
      <View style={styles.bar} testID="plan-accepted">
        <Text style={styles.done}>This run is the window’s accepted plan.</Text>
        {canAct ? <Button label="Adjust and run again" variant="quiet" onPress={onAdjust} testID="plan-adjust" /> : null}
      </View>
    );
  }
  if (!canAct) return null;
  const ready = !plan.stale && outagesAllTicked(review, ticked);
  const hint = acceptHint(plan, review, ticked);
  const onAccept = () => accept.mutate({ planId: plan.id, body: { outageAccepted: unresolvedSlices(review).map((s) => s.slice).filter((s) => ticked.includes(s)) } });
  return (
    <View style={styles.bar}>
      <View style={styles.actions}>
        <Button label="Accept plan" onPress={onAccept} disabled={!ready} busy={accept.isPending} testID="plan-accept" />
        <Button label="Adjust and run again" variant="quiet" onPress={onAdjust} testID="plan-adjust" />
      </View>
      {hint ? <Text style={styles.muted} testID="plan-accept-hint">{hint}</Text> : null}
      {accept.isError ? (
        <Text style={styles.error} role="alert" testID="plan-accept-error">Not accepted: {accept.error.message}</Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  done: { ...type.bodyStrong, color: colors.primary },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
