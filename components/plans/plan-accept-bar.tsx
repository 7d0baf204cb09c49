// Accept this run as the window's plan (once every outage is a conscious choice), or adjust the settings and run again.
// Accepting asks once more and says what it commits to: the moves, the outages, the plan it replaces, sign-off next.
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Plan, PlanReview } from '@/shared/plans';
import { usePlanAcceptMutation, useWindowPlansQuery } from '@/hooks/queries/plans';
import { Button } from '@/components/button';
import { outagesAllTicked, unresolvedSlices } from '@/components/plans/plan-review-data';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { plan: Plan; review: PlanReview; canAct: boolean; ticked: readonly string[]; onAdjust: () => void };

function acceptHint(plan: Plan, review: PlanReview, ticked: readonly string[]): string | null {
  if (plan.stale) return 'The window changed after this run, so it can no longer be accepted. Adjust and run again.';
  const open = unresolvedSlices(review).filter((s) => !ticked.includes(s.slice)).length;
  if (open > 0) return `Tick the outage of ${open === 1 ? 'the unresolved slice' : `all ${open} unresolved slices`} above to accept this plan.`;
  return null;
}

const slices = (n: number) => `${n} ${n === 1 ? 'slice' : 'slices'}`;

/** The sentences of the confirmation, one per commitment; counted from the review's slices. */
export function acceptCommitments(review: PlanReview, replacesEarlierPlan: boolean): string[] {
  const moved = review.slices.filter((s) => s.outcome === 'move').length;
  const rerouted = review.slices.filter((s) => s.outcome === 'reroute').length;
  const knockOn = review.slices.filter((s) => (s.outcome === 'move' || s.outcome === 'reroute') && s.madeRoomFor.length > 0).length;
  const outages = review.slices.filter((s) => s.outcome === 'unresolved');
  const changing = moved + rerouted;
  return [
    changing === 0
      ? 'No slice moves: every affected slice stays where it is.'
      : `${slices(changing)} change place when the work starts: ${moved} ${moved === 1 ? 'moves' : 'move'} to other sites, ${rerouted} ${rerouted === 1 ? 'is' : 'are'} rerouted`
        + (knockOn > 0 ? ` (${knockOn} of them untouched by the work, moved only to make room).` : '.'),
    outages.length === 0
      ? 'Every affected slice stays in service.'
      : `${slices(outages.length)} cannot be kept in service and will have an outage during the window: ${outages.map((s) => s.name).join(', ')}.`,
    replacesEarlierPlan
      ? 'It replaces the plan accepted earlier for this window.'
      : 'It becomes the window’s plan; no other plan is accepted yet.',
    'Next: a planner submits it for sign-off, and the change board approves it or sends it back.',
  ];
}

export function PlanAcceptBar({ plan, review, canAct, ticked, onAdjust }: Props) {
  const accept = usePlanAcceptMutation(plan.windowId);
  const runs = useWindowPlansQuery(plan.windowId, canAct);
  const [confirming, setConfirming] = useState(false);
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
  const earlier = runs.data?.plans.find((p) => p.accepted && p.id !== plan.id) ?? null;
  // The mutation names the accepted plan this one replaces (from the same list), as the confirmation said.
  const onAccept = () => accept.mutate(
    { planId: plan.id, body: { outageAccepted: unresolvedSlices(review).map((s) => s.slice).filter((s) => ticked.includes(s)) } },
    // A refusal closes the question, so its reason sits beside Accept and Adjust.
    { onError: () => setConfirming(false) },
  );
  return (
    <View style={styles.bar}>
      {confirming && ready ? (
        <View style={styles.confirm} testID="plan-accept-confirm">
          <Text style={styles.heading}>Accept this plan?</Text>
          {acceptCommitments(review, earlier !== null).map((line) => <Text key={line} style={styles.body}>• {line}</Text>)}
          <View style={styles.actions}>
            <Button label="Accept this plan" onPress={onAccept} busy={accept.isPending} testID="plan-accept-yes" />
            <Button label="Not yet" variant="quiet" onPress={() => setConfirming(false)} disabled={accept.isPending} testID="plan-accept-no" />
          </View>
        </View>
      ) : (
        <View style={styles.actions}>
          <Button label="Accept plan" onPress={() => setConfirming(true)} disabled={!ready} testID="plan-accept" />
          <Button label="Adjust and run again" variant="quiet" onPress={onAdjust} testID="plan-adjust" />
        </View>
      )}
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
  confirm: { gap: space.sm, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surfaceSunken },
  heading: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  done: { ...type.bodyStrong, color: colors.primary },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.bodyStrong, color: colors.danger },
});
