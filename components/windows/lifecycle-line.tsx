// Where the window stands: the usual steps with the current one marked, and a sentence saying what it means.
import { StyleSheet, Text, View } from 'react-native';
import type { WindowStatus } from '@/shared/windows';
import { MAIN_PATH, STATUS_LABELS, STATUS_SENTENCES } from '@/components/windows/lifecycle';
import { colors, space, type } from '@/constants/theme';

export function LifecycleLine({ status }: { status: WindowStatus }) {
  const onPath = MAIN_PATH.includes(status);
  const reached = onPath ? MAIN_PATH.indexOf(status) : -1;
  return (
    <View style={styles.box} testID="window-lifecycle">
      <Text style={styles.steps} accessibilityLabel={`Lifecycle: now ${STATUS_LABELS[status]}`}>
        {MAIN_PATH.map((step, index) => (
          <Text key={step} style={index === reached ? styles.current : index < reached ? styles.past : styles.future}>
            {index > 0 ? ' › ' : ''}
            {STATUS_LABELS[step]}
          </Text>
        ))}
        {onPath ? null : <Text style={styles.current}>{`  (now ${STATUS_LABELS[status].toLowerCase()})`}</Text>}
      </Text>
      <Text style={styles.sentence} testID="window-lifecycle-sentence">{STATUS_SENTENCES[status]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  steps: { ...type.caption },
  past: { color: colors.inkMuted },
  current: { color: colors.primary, fontFamily: type.label.fontFamily },
  future: { color: colors.inkFaint },
  sentence: { ...type.body, color: colors.ink },
});
