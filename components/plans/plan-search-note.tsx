// Says so when the search's own plan was worse than greedy's and the greedy plan is the one shown, with the
// search's figures, so the planner judges the search by what it found rather than by the fallback.
import { StyleSheet, Text, View } from 'react-native';
import type { PlanReview } from '@/shared/plans';
import { formatObjective } from '@/components/plans/plan-format';
import { colors, radii, space, type } from '@/constants/theme';

export function searchFallbackText(search: NonNullable<PlanReview['search']>): string {
  const figures = formatObjective(search.objective);
  return search.feasible
    ? `The search's own plan was worse (${figures}), so the greedy plan is shown instead.`
    : `The search found no plan within every capacity and latency limit (its best: ${figures}), so the greedy plan is shown instead.`;
}

export function PlanSearchNote({ search }: { search: PlanReview['search'] }) {
  if (search?.usedFallback !== 'greedy') return null;
  return (
    <View style={styles.note} testID="plan-search-fallback">
      <Text style={styles.title}>Showing the greedy plan</Text>
      <Text style={styles.body}>{searchFallbackText(search)}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  note: { gap: space.xxs, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.buoy, backgroundColor: colors.surface },
  title: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
});
