// Utilisation as a short bar plus its percentage; the bar turns to warning from 80 % and to danger above 100 %.
import { StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

/** From this share of capacity an element counts as running hot. */
export const UTILISATION_HIGH = 0.8;

export function utilisationTone(share: number): string {
  if (share > 1) return colors.danger;
  if (share >= UTILISATION_HIGH) return colors.warning;
  return colors.primary;
}

export function formatPercent(share: number): string {
  return `${Math.round(share * 100)} %`;
}

type Props = { share: number | null | undefined; testID?: string };

export function UtilisationBar({ share, testID }: Props) {
  if (share === null || share === undefined || !Number.isFinite(share)) {
    return <Text style={styles.none}>—</Text>;
  }
  const widthPercent = Math.max(0, Math.min(1, share)) * 100;
  return (
    // The percentage is the text a screen reader reads; the bar beside it only draws it.
    <View style={styles.row} testID={testID}>
      <View style={styles.track}>
        <View style={[styles.fill, { width: `${widthPercent}%`, backgroundColor: utilisationTone(share) }]} />
      </View>
      <Text style={[styles.percent, share > 1 && { color: colors.danger }]}>{formatPercent(share)}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minWidth: 96 },
  track: { flex: 1, height: 6, borderRadius: radii.pill, backgroundColor: colors.surfaceSunken, overflow: 'hidden', minWidth: 40 },
  fill: { height: 6, borderRadius: radii.pill },
  percent: { ...type.label, color: colors.ink, minWidth: 44, textAlign: 'right' },
  // inkMuted, not inkFaint: the dash also sits on selected (primarySoft) rows.
  none: { ...type.body, color: colors.inkMuted },
});
