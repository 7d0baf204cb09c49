// The plan at a glance: how many slices move, are rerouted, stay or are left unresolved, what the moves cost, and
// how many of the moves are knock-on moves of untouched slices.
import { StyleSheet, Text, View } from 'react-native';
import type { PlanReview } from '@/shared/plans';
import type { TouchCounts } from '@/shared/touch-counts';
import { TouchCountsView } from '@/components/impact/touch-counts';
import { formatCost, MOVE_COST_DEFINITION, runTimeWords } from '@/components/plans/plan-format';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  review: PlanReview;
  /** the window's slices in the shared vocabulary (impact + this plan) */
  counts: TouchCounts;
  /** the whole run's wall time as the progress showed it; null when not recorded */
  wholeRunMs: number | null;
};

export function PlanTotals({ review, counts, wholeRunMs }: Props) {
  const t = review.totals;
  const tiles = [
    { key: 'moved', label: 'Moved', value: String(t.moved) },
    { key: 'rerouted', label: 'Rerouted', value: String(t.rerouted) },
    { key: 'stays', label: 'Stay', value: String(t.stays) },
    { key: 'unresolved', label: 'Unresolved', value: String(t.unresolved), alarm: t.unresolved > 0 },
    { key: 'move-cost', label: 'Move cost (points)', value: formatCost(t.moveCost) },
  ];
  return (
    <View style={styles.box} testID="plan-totals">
      <TouchCountsView counts={counts} />
      <Text style={styles.label}>What the plan does with them</Text>
      <View style={styles.tiles}>
        {tiles.map((tile) => (
          <View key={tile.key} style={styles.tile}>
            <Text style={[styles.value, tile.alarm && styles.alarm]} testID={`plan-total-${tile.key}`}>{tile.value}</Text>
            <Text style={styles.label}>{tile.label}</Text>
          </View>
        ))}
      </View>
      {t.knockOn > 0 ? (
        <Text style={styles.body} testID="plan-total-knock-on">
          {t.knockOn === 1
            ? 'Includes 1 knock-on move: a slice the work does not touch, moved to make room (counted under Moved or Rerouted).'
            : `Includes ${t.knockOn} knock-on moves: slices the work does not touch, moved to make room (counted under Moved or Rerouted).`}
        </Text>
      ) : null}
      <Text style={styles.muted} testID="plan-total-move-cost-definition">{MOVE_COST_DEFINITION}</Text>
      <Text style={styles.muted} testID="plan-run-time">
        {runTimeWords(review.computeMs, wholeRunMs)}
        {review.reservedFor.length > 0 ? ` · capacity held for ${review.reservedFor.length} overlapping ${review.reservedFor.length === 1 ? 'window' : 'windows'}` : ''}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  tiles: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  // Three to a row, whatever the width: a phone and the wide screen's left column both read as 3 + 2 tiles.
  tile: {
    flexGrow: 1, flexBasis: '30%', minWidth: 90, padding: space.md, borderRadius: radii.md, backgroundColor: colors.surface,
    borderWidth: 1, borderColor: colors.border, gap: space.xxs,
  },
  value: { ...type.figure, color: colors.abyss },
  alarm: { color: colors.danger },
  label: { ...type.label, color: colors.inkMuted },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
