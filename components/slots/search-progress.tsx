// A slot search or campaign still computing: a bar over the slots (or groups) checked, the count in words and the
// seconds taken. The result replaces it by itself when the job finishes.
import { StyleSheet, Text, View } from 'react-native';
import type { SearchProgress, SearchStatus } from '@/shared/slots';
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
  const fraction = progress && progress.total > 0 ? Math.min(1, progress.done / progress.total) : 0;
  const percent = Math.round(fraction * 100);
  const text = status === 'queued' ? 'Waiting for a worker to pick the search up…' : progressText(progress, unit);
  return (
    <View style={styles.box} testID={testID}>
      <Text style={styles.heading} testID={`${testID}-text`}>{text}</Text>
      <View
        style={styles.track}
        role="progressbar"
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={text}
        aria-label={label}
        testID={`${testID}-bar`}
      >
        <View style={[styles.fill, { width: `${percent}%` }]} />
      </View>
      <Text style={styles.muted} testID={`${testID}-elapsed`}>Time taken: {elapsedText(progress)}</Text>
      <Text style={styles.muted}>The result appears here by itself when the search finishes.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md, padding: space.lg, backgroundColor: colors.surface, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border },
  heading: { ...type.heading, color: colors.ink },
  track: { height: 14, borderRadius: radii.pill, backgroundColor: colors.surfaceSunken, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: colors.primary, borderRadius: radii.pill },
  muted: { ...type.caption, color: colors.inkMuted },
});
