// A determinate progress bar with its accessible name and value: plan runs, slot searches and campaign plans.
import { StyleSheet, View } from 'react-native';
import { colors, radii } from '@/constants/theme';

type Props = {
  /** 0–1; clamped */
  fraction: number;
  /** the bar's accessible name */
  label: string;
  /** what the bar stands for in words, for screen readers (otherwise they read the percentage) */
  valueText?: string;
  testID: string;
  fillTestID?: string;
};

export function ProgressTrack({ fraction, label, valueText, testID, fillTestID }: Props) {
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <View
      style={styles.track}
      role="progressbar"
      aria-valuemin={0}
      aria-valuemax={100}
      aria-valuenow={percent}
      aria-valuetext={valueText}
      aria-label={label}
      testID={testID}
    >
      <View style={[styles.fill, { width: `${percent}%` }]} testID={fillTestID} />
    </View>
  );
}

const styles = StyleSheet.create({
  track: { height: 14, borderRadius: radii.pill, backgroundColor: colors.surfaceSunken, overflow: 'hidden' },
  fill: { height: '100%', backgroundColor: colors.primary, borderRadius: radii.pill },
});
