// A finished run. Phones: cautions and totals, the unresolved slices and the decision, then the map and the details.
// From WIDE_LAYOUT_MIN_WIDTH_PX two columns: on the left what the planner decides on (totals, unresolved slices,
// Accept / Adjust, per-slice outcomes); on the right the evidence (map, convergence, references, steps, risk).
import { useMemo, useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { Plan, PlanReview } from '@/shared/plans';
import { CriticalCaution } from '@/components/critical-caution';
import { PlanAcceptBar } from '@/components/plans/plan-accept-bar';
import { PlanConvergence } from '@/components/plans/plan-convergence';
import { PlanMap } from '@/components/plans/plan-map';
import { PlanReferences } from '@/components/plans/plan-references';
import { unresolvedSlices } from '@/components/plans/plan-review-data';
import { PlanRisk } from '@/components/plans/plan-risk';
import { PlanSearchNote } from '@/components/plans/plan-search-note';
import { PlanSliceOutcomes } from '@/components/plans/plan-slice-outcomes';
import { PlanSteps } from '@/components/plans/plan-steps';
import { PlanTotals } from '@/components/plans/plan-totals';
import { PlanUnresolved } from '@/components/plans/plan-unresolved';
import { useElementNames } from '@/components/plans/use-element-names';
import { Section } from '@/components/windows/section';
import { useWindowImpactQuery } from '@/hooks/queries/windows';
import { touchCounts, touchedFromImpact } from '@/shared/touch-counts';
import { space } from '@/constants/theme';

export type PlanLinks = { onAdjust: () => void; onReschedule: () => void; onAddCapacity: (where: 'imports' | 'network') => void };

type Props = PlanLinks & { plan: Plan; review: PlanReview; canAct: boolean; wide: boolean };

export function PlanReviewView({ plan, review, canAct, wide, onAdjust, onReschedule, onAddCapacity }: Props) {
  const names = useElementNames(review.slices.map((s) => s.slice));
  const impact = useWindowImpactQuery(plan.windowId);
  // The impact counts slices that only lose protection, which a plan never lists; it only applies to the window
  // version the plan was computed for.
  const impactSlices = impact.data && impact.data.windowVersion === plan.windowVersion ? touchedFromImpact(impact.data.affected) : null;
  const counts = touchCounts(impactSlices, review.slices);
  const [selected, setSelected] = useState<string | null>(null);
  const [ticked, setTicked] = useState<string[]>(plan.outageAccepted);
  const sliceName = useMemo(() => {
    const byId = new Map(review.slices.map((s) => [s.slice, s.name]));
    return (id: string) => byId.get(id) ?? id;
  }, [review.slices]);
  const unresolved = unresolvedSlices(review);
  const critical = review.slices.filter((s) => s.critical).map((s) => s.name);
  const toggle = (slice: string) => setTicked((t) => (t.includes(slice) ? t.filter((s) => s !== slice) : [...t, slice]));

  const decision = (
    <>
      <PlanTotals review={review} counts={counts} wholeRunMs={plan.status === 'done' ? plan.progress?.elapsedMs ?? null : null} />
      <PlanSearchNote search={review.search} />
      {unresolved.length > 0 ? (
        <PlanUnresolved
          slices={unresolved}
          ticked={ticked}
          canTick={canAct && !plan.accepted && !plan.stale}
          onToggle={toggle}
          onReschedule={onReschedule}
          onAddCapacity={onAddCapacity}
        />
      ) : null}
      <PlanAcceptBar plan={plan} review={review} canAct={canAct} ticked={ticked} onAdjust={onAdjust} />
    </>
  );
  const outcomes = (
    <Section title="What happens to each slice" aside={<Text>{review.slices.length}</Text>} testID="plan-outcomes">
      <PlanSliceOutcomes slices={review.slices} names={names} selected={selected} onSelect={setSelected} />
    </Section>
  );
  const map = <Section title="Map"><PlanMap slices={review.slices} selectedSlice={selected} /></Section>;
  const details = (
    <>
      <Section title="How the search went"><PlanConvergence trace={review.trace} /></Section>
      <Section title="Compared with the references"><PlanReferences review={review} /></Section>
      <Section title="Order of the moves (make before break)"><PlanSteps review={review} names={names} sliceName={sliceName} /></Section>
      <Section title="Risk during the window"><PlanRisk risk={review.risk} sliceName={sliceName} /></Section>
    </>
  );
  return (
    <View style={styles.body} testID="plan-review">
      {critical.length > 0 ? (
        <CriticalCaution
          testID="plan-critical-caution"
          title="Caution: this plan involves an emergency, health or utility service"
          lead={`Critical slices in this plan: ${critical.join(', ')}.`}
        />
      ) : null}
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.column} testID="plan-review-decision">{decision}{outcomes}</View>
          <View style={styles.column} testID="plan-review-evidence">{map}{details}</View>
        </View>
      ) : (
        // Phones: the map before the long per-slice list, so the change reads at a glance.
        <>{decision}{map}{outcomes}{details}</>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  body: { gap: space.md },
  columns: { flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' },
  column: { flex: 1, minWidth: 0, gap: space.md },
});
