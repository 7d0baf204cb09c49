// Where the window stands: the usual steps as a list with the current one marked (in words, weight and
// aria-current="step", never by colour alone), and a sentence saying what it means.
import { StyleSheet, Text, View } from 'react-native';
import type { WindowStatus } from '@/shared/windows';
import { MAIN_PATH, STATUS_LABELS, STATUS_SENTENCES } from '@/components/windows/lifecycle';
import { colors, space, type } from '@/constants/theme';

type StepState = 'past' | 'current' | 'future';

function Step({ label, state, first }: { label: string; state: StepState; first: boolean }) {
  return (
    <View role="listitem" aria-current={state === 'current' ? 'step' : undefined} style={styles.step}
      testID={state === 'current' ? 'window-lifecycle-current' : undefined}>
      {first ? null : <Text style={styles.separator} aria-hidden>›</Text>}
      <Text style={state === 'current' ? styles.current : state === 'past' ? styles.past : styles.future}>
        {state === 'past' ? `✓ ${label}` : label}
        {state === 'current' ? <Text style={styles.nowTag}> (now)</Text> : null}
      </Text>
    </View>
  );
}

export function LifecycleLine({ status }: { status: WindowStatus }) {
  const onPath = MAIN_PATH.includes(status);
  const reached = onPath ? MAIN_PATH.indexOf(status) : -1;
  return (
    <View style={styles.box} testID="window-lifecycle">
      <View role="list" aria-label="Lifecycle" style={styles.steps}>
        {MAIN_PATH.map((step, index) => (
          <Step key={step} label={STATUS_LABELS[step]} first={index === 0}
            state={index === reached ? 'current' : index < reached ? 'past' : 'future'} />
        ))}
        {onPath ? null : <Step label={STATUS_LABELS[status]} state="current" first={false} />}
      </View>
      <Text style={styles.sentence} testID="window-lifecycle-sentence">{STATUS_SENTENCES[status]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  steps: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', rowGap: space.xxs },
  step: { flexDirection: 'row', alignItems: 'baseline' },
  separator: { ...type.caption, color: colors.inkMuted, paddingHorizontal: space.xs },
  past: { ...type.caption, color: colors.inkMuted },
  // The current step stands out by weight, an underline and "(now)", not only by its colour.
  current: { ...type.caption, fontFamily: type.label.fontFamily, color: colors.ink, textDecorationLine: 'underline' },
  nowTag: { fontFamily: type.caption.fontFamily, textDecorationLine: 'none' },
  future: { ...type.caption, color: colors.inkMuted },
  sentence: { ...type.body, color: colors.ink },
});
