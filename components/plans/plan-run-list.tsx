// The runs of a window, newest first: state, when, how it came out and with which settings, for comparison.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { PlanListItem } from '@/shared/plans';
import { formatInstant } from '@/components/time';
import { formatMovePoints, settingsSummary } from '@/components/plans/plan-format';
import { PlanMarks, PlanStatusPill } from '@/components/plans/plan-status-pill';
import { colors, radii, space, type } from '@/constants/theme';
import { linkKeyProps } from '@/components/key-props';

type Props = { plans: readonly PlanListItem[]; timeZone: string; onOpen: (planId: string) => void };

function totalsLine(plan: PlanListItem): string {
  if (plan.totals) {
    const t = plan.totals;
    const room = t.knockOn > 0 ? ` · ${t.knockOn} untouched ${t.knockOn === 1 ? 'slice' : 'slices'} moved to make room` : '';
    return `${t.moved} moved · ${t.rerouted} rerouted · ${t.unresolved} cannot be kept · move cost ${formatMovePoints(t.moveCost)}${room}`;
  }
  if (plan.status === 'failed') return plan.error ?? 'The run failed.';
  if (plan.status === 'cancelled') return plan.error ?? 'Cancelled before it finished.';
  if (plan.progress) return `Round ${plan.progress.generation}…`;
  return 'Not started yet.';
}

/** Newest first; the server's order is not relied on. */
export function sortRuns(plans: readonly PlanListItem[]): PlanListItem[] {
  return [...plans].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
}

export function PlanRunList({ plans, timeZone, onOpen }: Props) {
  return (
    <View style={styles.list} testID="plan-runs" role="list" aria-label="Runs of this window">
      {sortRuns(plans).map((plan) => (
        <View role="listitem" key={plan.id}>
          <Pressable
            role="link"
            onPress={() => onOpen(plan.id)}
            {...linkKeyProps(() => onOpen(plan.id))}
            style={({ pressed }) => [styles.row, pressed && styles.pressed]}
            testID={`plan-row-${plan.id}`}
          >
            <View style={styles.head}>
              <PlanStatusPill status={plan.status} testID={`plan-row-status-${plan.id}`} />
              <PlanMarks accepted={plan.accepted} stale={plan.stale} />
            </View>
            <Text style={styles.when}>{formatInstant(plan.createdAt, timeZone)}</Text>
            <Text style={plan.status === 'failed' ? styles.error : styles.body}>{totalsLine(plan)}</Text>
            <Text style={styles.muted}>{settingsSummary(plan.settings)}</Text>
          </Pressable>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { gap: space.xs, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  pressed: { backgroundColor: colors.primarySoft },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  when: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.body, color: colors.danger },
});
