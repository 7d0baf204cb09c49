// The caution on every impact that touches a critical slice (DESIGN §7): people's safety can depend on it.
import { StyleSheet, Text, View } from 'react-native';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

export const CRITICAL_CAUTION_TITLE = 'Caution: this work touches an emergency, health or utility service';

/** Our own words for DESIGN §7; each point is a separate line so none is skimmed over. */
export const CRITICAL_CAUTION_POINTS = [
  'Agree the timing and any fallback with the service’s own operations team before the work goes ahead.',
  'Follow the regulator’s rules on availability of emergency services, and local practice, for this kind of work.',
  'Do not rely on the figures here alone: the risk numbers are estimates from a model, not a guarantee.',
] as const;

export function CriticalCaution({ sliceNames }: { sliceNames: readonly string[] }) {
  return (
    <View style={styles.box} role="alert" testID="impact-critical-caution">
      <Text style={styles.title}>{CRITICAL_CAUTION_TITLE}</Text>
      <Text style={styles.body}>Critical slices affected: {sliceNames.join(', ')}.</Text>
      {CRITICAL_CAUTION_POINTS.map((point) => (
        <View key={point} style={styles.point}>
          <Text style={styles.bullet}>•</Text>
          <Text style={styles.body}>{point}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: space.sm, padding: space.lg, borderRadius: radii.md, borderWidth: 2,
    borderColor: calendarColors.critical, backgroundColor: calendarColors.criticalSoft,
  },
  title: { ...type.heading, color: calendarColors.critical },
  point: { flexDirection: 'row', gap: space.sm },
  bullet: { ...type.bodyStrong, color: calendarColors.critical },
  body: { ...type.body, color: colors.ink, flexShrink: 1 },
});
