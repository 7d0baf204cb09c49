// A window's move plans: every run for comparison (newest first) and, for planners, the form for a new run.
import { useState, type ReactNode } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { Me } from '@/shared/api';
import type { PlanListItem, PlanSettings } from '@/shared/plans';
import type { Window } from '@/shared/windows';
import { Button } from '@/components/button';
import { EmptyState } from '@/components/screen-states';
import { PlanPage } from '@/components/plans/plan-page';
import { PlanRunForm } from '@/components/plans/plan-run-form';
import { PlanRunList } from '@/components/plans/plan-run-list';
import { canRunPlans, windowTakesRuns } from '@/shared/permissions';
import { useRunOptions } from '@/components/plans/use-run-options';
import { Section } from '@/components/windows/section';
import { StatusBadge } from '@/components/windows/status-badge';
import { colors, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = {
  window: Window;
  me: Me;
  plans: readonly PlanListItem[];
  timeZone: string;
  /** settings of the run being adjusted (?from=<planId>); opens the form pre-filled */
  adjustFrom?: PlanSettings;
  onOpenPlan: (planId: string) => void;
  onOpenWindow: () => void;
  /** the window's next-step bar */
  next?: ReactNode;
};

function NewRun({ window: w, me, adjustFrom, onOpenPlan, startOpen }: Pick<Props, 'window' | 'me' | 'adjustFrom' | 'onOpenPlan'> & { startOpen: boolean }) {
  const [open, setOpen] = useState(startOpen || !!adjustFrom);
  const options = useRunOptions(w.id);
  if (!canRunPlans(me.roles)) return null;
  if (!windowTakesRuns(w.status)) {
    return <Text style={styles.muted} testID="plans-not-plannable">New runs need a window whose impact is assessed and whose work has not started.</Text>;
  }
  if (!open) return <Button label="New run" onPress={() => setOpen(true)} testID="plans-new-run" />;
  return (
    <Section title={adjustFrom ? 'Adjust and run again' : 'New run'}>
      <PlanRunForm
        windowId={w.id}
        initial={adjustFrom}
        functionOptions={options.functionOptions}
        siteOptions={options.siteOptions}
        loading={options}
        onQueued={onOpenPlan}
        onClose={startOpen ? undefined : () => setOpen(false)}
      />
    </Section>
  );
}

export function PlansView({ window: w, me, plans, timeZone, adjustFrom, onOpenPlan, onOpenWindow, next }: Props) {
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  const runs: ReactNode = plans.length === 0
    ? <EmptyState title="No runs yet" hint={canRunPlans(me.roles) ? 'Start a run to see where the affected slices could go.' : 'A planner has not run the re-mapper for this window yet.'} />
    : <PlanRunList plans={plans} timeZone={timeZone} onOpen={onOpenPlan} />;
  const form = <NewRun window={w} me={me} adjustFrom={adjustFrom} onOpenPlan={onOpenPlan} startOpen={wide} />;
  return (
    <PlanPage back={{ label: '‹ Back to the window', onPress: onOpenWindow, testID: 'plans-back' }} title={`Move plans: ${w.title}`} next={next}>
      <StatusBadge status={w.status} testID="plans-window-status" />
      {wide ? (
        <View style={styles.columns}>
          <View style={styles.main}><Section title="Runs">{runs}</Section></View>
          <View style={styles.side}>{form}</View>
        </View>
      ) : (
        <>
          {form}
          <Section title="Runs">{runs}</Section>
        </>
      )}
    </PlanPage>
  );
}

const styles = StyleSheet.create({
  columns: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0 },
  side: { flex: 1, minWidth: 0 },
  muted: { ...type.caption, color: colors.inkMuted },
});
