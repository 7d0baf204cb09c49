// One run: its settings, then progress while it computes, the review when done, or why it failed or stopped.
import type { ReactNode } from 'react';
import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { Me } from '@/shared/api';
import type { Plan } from '@/shared/plans';
import { usePlanCancelMutation } from '@/hooks/queries/plans';
import { Button } from '@/components/button';
import { formatInstant } from '@/components/time';
import { settingsSummary } from '@/components/plans/plan-format';
import { PlanProgressView } from '@/components/plans/plan-progress';
import { PlanReviewView, type PlanLinks } from '@/components/plans/plan-review';
import { canRunPlans } from '@/shared/permissions';
import { PlanPage } from '@/components/plans/plan-page';
import { PlanMarks, PlanStatusPill } from '@/components/plans/plan-status-pill';
import { colors, radii, space, type, WIDE_LAYOUT_MIN_WIDTH_PX } from '@/constants/theme';

type Props = PlanLinks & {
  plan: Plan; windowTitle: string; me: Me; timeZone: string; onOpenRuns: () => void;
  /** the window's next-step bar */
  next?: ReactNode;
};

function Body({ plan, me, wide, ...links }: PlanLinks & { plan: Plan; me: Me; wide: boolean }) {
  const cancel = usePlanCancelMutation(plan.windowId);
  const canAct = canRunPlans(me.roles);
  if (plan.status === 'queued' || plan.status === 'running') {
    return (
      <PlanProgressView
        plan={plan}
        canCancel={canAct}
        cancelling={cancel.isPending}
        cancelError={cancel.error?.message ?? null}
        onCancel={() => cancel.mutate(plan.id)}
      />
    );
  }
  if (plan.status === 'done' && plan.review) {
    return <PlanReviewView plan={plan} review={plan.review} canAct={canAct} wide={wide} {...links} />;
  }
  const failed = plan.status === 'failed';
  return (
    <View style={[styles.notice, failed && styles.failed]} role={failed ? 'alert' : undefined} testID={failed ? 'plan-failed' : 'plan-stopped'}>
      <Text style={failed ? styles.errorTitle : styles.heading}>{failed ? 'The run failed' : 'The run was cancelled'}</Text>
      <Text style={styles.body} testID="plan-error">{plan.error ?? (failed ? 'No reason was recorded.' : 'Stopped before it finished.')}</Text>
      {canAct ? <Button label="Adjust and run again" variant="quiet" onPress={links.onAdjust} testID="plan-adjust" /> : null}
    </View>
  );
}

export function PlanDetailView({ plan, windowTitle, me, timeZone, onOpenRuns, next, ...links }: Props) {
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_LAYOUT_MIN_WIDTH_PX;
  return (
    <PlanPage back={{ label: '‹ All runs of this window', onPress: onOpenRuns, testID: 'plan-back' }} title={`Move plan: ${windowTitle}`} next={next}>
      <View style={styles.row}>
        <PlanStatusPill status={plan.status} testID="plan-status" />
        <PlanMarks accepted={plan.accepted} stale={plan.stale} />
      </View>
      <Text style={styles.muted}>Started {formatInstant(plan.createdAt, timeZone)} · {settingsSummary(plan.settings)}</Text>
      {plan.stale ? (
        <Text style={styles.warning} testID="plan-stale">The window was changed after this run; its figures may no longer hold and it cannot be accepted.</Text>
      ) : null}
      <Body plan={plan} me={me} wide={wide} {...links} />
    </PlanPage>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  muted: { ...type.caption, color: colors.inkMuted },
  warning: { ...type.bodyStrong, color: colors.warning },
  notice: { gap: space.sm, padding: space.lg, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  failed: { borderColor: colors.danger, backgroundColor: colors.dangerSoft },
  heading: { ...type.heading, color: colors.ink },
  errorTitle: { ...type.heading, color: colors.danger },
  body: { ...type.body, color: colors.ink },
});
