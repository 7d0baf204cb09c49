// A slot search or campaign still computing: a bar over the slots (or groups) checked, the count in words and the
// seconds taken. The result replaces it by itself when the job finishes.
import { StyleSheet, Text, View } from 'react-native';
import type { SearchProgress, SearchStatus } from '@/shared/slots';
import { ProgressTrack } from '@/components/progress-track';
import { elapsedText, progressText } from '@/components/slots/slot-words';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  status: SearchStatus | string;
  progress: SearchProgress | null;
  unit?: 'slots' | 'groups';
  /** the bar's accessible name */
  label: string;
  testID: string;
};

export function SearchProgressView({ status, progress, unit = 'slots', label, testID }: Props) {
  const fraction = progress && progress.total > 0 ? progress.done / progress.total : 0;
  const text = status === 'queued' ? 'Waiting for a worker to pick the search up…' : progressText(progress, unit);
  return (
    <View style={styles.box} testID={testID}>
      <Text style={styles.heading} testID={`${testID}-text`}>{text}</Text>
      <ProgressTrack fraction={fraction} label={label} valueText={text} testID={`${testID}-bar`} />
      <Text style={styles.muted} testID={`${testID}-elapsed`}>Time taken: {elapsedText(progress)}</Text>
      <Text style={styles.muted}>The result appears here by itself when the search finishes.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, padding: space.lg, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border },
  heading: { ...type.heading, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
});
