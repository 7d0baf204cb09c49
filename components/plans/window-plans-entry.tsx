// The window page's way into move plans: how many runs there are, the accepted one if any, and a link to them.
// Its buttons are quiet: the next-step bar above holds the window's one filled button.
import { StyleSheet, Text, View } from 'react-native';
import type { Me } from '@/shared/api';
import { useWindowPlansQuery } from '@/hooks/queries/plans';
import { Button } from '@/components/button';
import { formatMovePoints } from '@/components/plans/plan-format';
import { canReadPlans } from '@/shared/permissions';
import { Section } from '@/components/windows/section';
import { colors, space, type } from '@/constants/theme';

type Props = { windowId: string; me: Me; onOpenPlans: () => void; onOpenPlan: (planId: string) => void };

export function WindowPlansEntry({ windowId, me, onOpenPlans, onOpenPlan }: Props) {
  const reader = canReadPlans(me.roles);
  const plans = useWindowPlansQuery(windowId, reader);
  if (!reader) return null;
  const accepted = plans.data?.plans.find((p) => p.accepted) ?? null;
  const count = plans.data?.plans.length ?? 0;
  let summary: string;
  if (plans.isError) summary = `Could not load the runs: ${plans.error.message}`;
  else if (!plans.data) summary = 'Loading the runs…';
  else if (accepted?.totals) {
    const t = accepted.totals;
    summary = `Accepted plan: ${t.moved} moved, ${t.rerouted} rerouted, ${t.unresolved} cannot be kept, move cost ${formatMovePoints(t.moveCost)}.`;
  } else if (accepted) summary = 'A plan is accepted.';
  else summary = count === 0 ? 'No runs yet.' : `${count} ${count === 1 ? 'run' : 'runs'}, none accepted yet.`;
  return (
    <Section title="Move plans" testID="window-plans">
      <Text style={accepted ? styles.strong : styles.muted} testID="window-plans-summary">{summary}</Text>
      <View style={styles.row}>
        <Button label="Move plans" variant="quiet" onPress={onOpenPlans} testID="window-plans-open" />
        {accepted ? <Button label="Open the accepted plan" variant="quiet" onPress={() => onOpenPlan(accepted.id)} testID="window-plans-accepted" /> : null}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  strong: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.body, color: colors.inkMuted },
});
