// The run beside the reference solvers on the same window: the greedy placement, and the exact solver's optimum or bound.
import { StyleSheet, Text, View } from 'react-native';
import type { PlanObjective, PlanReview, ReferenceResult } from '@/shared/plans';
import { formatCost, formatDurationMs, formatObjective } from '@/components/plans/plan-format';
import { formatGap } from '@/components/plans/plan-review-data';
import { colors, radii, space, type } from '@/constants/theme';

function Row({ title, objective, detail, testID }: { title: string; objective: PlanObjective | null; detail: string | null; testID: string }) {
  return (
    <View style={styles.row} testID={testID}>
      <Text style={styles.title}>{title}</Text>
      <Text style={styles.body}>{objective ? formatObjective(objective) : 'No placement found'}</Text>
      {detail ? <Text style={styles.muted}>{detail}</Text> : null}
    </View>
  );
}

function exactDetail(exact: ReferenceResult): string {
  const parts = [`took ${formatDurationMs(exact.elapsedMs)}`];
  if (exact.optimal) parts.unshift('proven optimal');
  else {
    const gap = formatGap(exact.gap);
    if (exact.bound !== null) parts.unshift(`bound ${formatCost(exact.bound)}`);
    if (gap) parts.unshift(`gap to the bound ${gap}`);
  }
  if (exact.note) parts.push(exact.note);
  return parts.join(' · ');
}

/** Only the figures it shows, so the change-board pack can hand over its copy of them. */
type ReferenceFigures = Pick<PlanReview, 'objective' | 'computeMs' | 'search' | 'greedy' | 'exact'>;

/** The run's figures are the greedy plan's when it was kept; the search's own then follow, so neither is hidden. */
function runDetail(review: ReferenceFigures): string {
  const took = `search ${formatDurationMs(review.computeMs)}`;
  if (review.search?.usedFallback !== 'greedy') return took;
  return `${took} · greedy plan kept; the search alone: ${formatObjective(review.search.objective)}${review.search.feasible ? '' : ' (outside a limit)'}`;
}

export function PlanReferences({ review }: { review: ReferenceFigures }) {
  const { greedy, exact } = review;
  return (
    <View style={styles.list} testID="plan-references">
      <Row title="This run" objective={review.objective} detail={runDetail(review)} testID="plan-ref-run" />
      <Row
        title="Greedy reference"
        objective={greedy.objective}
        detail={[`took ${formatDurationMs(greedy.elapsedMs)}`, greedy.note].filter(Boolean).join(' · ')}
        testID="plan-ref-greedy"
      />
      {exact ? (
        <Row title="Exact solver" objective={exact.objective} detail={exactDetail(exact)} testID="plan-ref-exact" />
      ) : (
        <View style={styles.row} testID="plan-ref-exact">
          <Text style={styles.title}>Exact solver</Text>
          <Text style={styles.muted}>Not run: the window is too large for it to finish in reasonable time.</Text>
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { gap: space.xxs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.tide },
  title: { ...type.label, color: colors.inkMuted },
  body: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
