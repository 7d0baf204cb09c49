// A run's state as a small pill: quiet while waiting, the primary tone while computing, green when finished.
import { StyleSheet, Text } from 'react-native';
import type { PlanRunStatus } from '@/shared/plans';
import { PLAN_STATUS_LABELS } from '@/components/plans/plan-format';
import { StatusPill } from '@/components/status-pill';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

const TONES: Record<PlanRunStatus, string> = {
  queued: colors.inkFaint,
  running: colors.primary,
  done: calendarColors.status.cleared,
  failed: colors.danger,
  cancelled: colors.inkMuted,
};

export function PlanStatusPill({ status, testID }: { status: PlanRunStatus; testID?: string }) {
  return <StatusPill label={PLAN_STATUS_LABELS[status]} tone={TONES[status]} testID={testID} />;
}

/** Marks beside the state: the accepted run, and runs made before the window last changed. */
export function PlanMarks({ accepted, stale }: { accepted: boolean; stale: boolean }) {
  return (
    <>
      {accepted ? <Text style={[styles.mark, styles.accepted]} testID="plan-mark-accepted">Accepted</Text> : null}
      {stale ? <Text style={[styles.mark, styles.stale]} testID="plan-mark-stale">Window changed since</Text> : null}
    </>
  );
}

const styles = StyleSheet.create({
  mark: { ...type.label, paddingHorizontal: space.sm, paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
  accepted: { color: colors.onPrimary, backgroundColor: calendarColors.status.planned },
  stale: { color: calendarColors.critical, backgroundColor: calendarColors.criticalSoft },
});
