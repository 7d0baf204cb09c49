// A run still computing: a bar over its time limit, the round it is on, the best plan so far and the time taken.
import { StyleSheet, Text, View } from 'react-native';
import type { Plan } from '@/shared/plans';
import { Button } from '@/components/button';
import { ProgressTrack } from '@/components/progress-track';
import { elapsedFigure, formatObjective, PHASE_LABELS, progressFraction } from '@/components/plans/plan-format';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { plan: Plan; canCancel: boolean; cancelling: boolean; cancelError: string | null; onCancel: () => void };

export function PlanProgressView({ plan, canCancel, cancelling, cancelError, onCancel }: Props) {
  const progress = plan.progress;
  const fraction = progress ? progressFraction(progress) : 0;
  const limitMs = progress?.timeLimitMs ?? plan.settings.timeLimitSeconds * 1000;
  return (
    <View style={styles.box} testID="plan-progress">
      <Text style={styles.heading}>
        {plan.status === 'queued' ? 'Waiting for a worker to pick the run up…' : progress ? PHASE_LABELS[progress.phase] : 'Starting…'}
      </Text>
      <ProgressTrack fraction={fraction} label="Search progress against its time limit" testID="plan-progress-bar" fillTestID="plan-progress-fill" />
      <View style={styles.figures}>
        <Figure label="Round" value={progress ? String(progress.generation) : '–'} testID="plan-progress-generation" />
        <Figure label="Time" value={elapsedFigure(progress, limitMs)} testID="plan-progress-elapsed" />
        <Figure label="Plans tried" value={progress ? String(progress.evaluations) : '–'} testID="plan-progress-evaluations" />
      </View>
      <Text style={styles.body} testID="plan-progress-best">
        Best so far: {progress?.best ? formatObjective(progress.best) : 'none yet'}
      </Text>
      {plan.attempts > 1 ? <Text style={styles.muted}>Attempt {plan.attempts}: an earlier worker stopped, this one started again.</Text> : null}
      {canCancel ? (
        <View style={styles.actions}>
          <Button label="Cancel run" variant="quiet" onPress={onCancel} busy={cancelling} testID="plan-cancel" />
        </View>
      ) : null}
      {cancelError ? <Text style={styles.error} role="alert">{cancelError}</Text> : null}
      <Text style={styles.muted}>The result appears here by itself when the run finishes.</Text>
    </View>
  );
}

function Figure({ label, value, testID }: { label: string; value: string; testID: string }) {
  return (
    <View style={styles.figure}>
      <Text style={styles.figureLabel}>{label}</Text>
      <Text style={styles.figureValue} testID={testID}>{value}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, padding: space.lg, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border },
  heading: { ...type.heading, color: colors.ink },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figure: { gap: space.xxs, minWidth: 90 },
  figureLabel: { ...type.label, color: colors.inkMuted },
  figureValue: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  error: { ...type.caption, color: colors.danger },
  actions: { flexDirection: 'row' },
});
