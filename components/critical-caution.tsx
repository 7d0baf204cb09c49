// The one caution (DESIGN §7) wherever a critical slice is involved: people's safety can depend on the service,
// so the work is agreed with its operators, follows the regulator and local practice, and the tool's figures
// support that judgement rather than replace it.
import { StyleSheet, Text, View } from 'react-native';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

/** Our own words for DESIGN §7; each point is a separate line so none is skimmed over. */
export const CRITICAL_CAUTION_POINTS = [
  'Agree the timing and any fallback with the service’s own operations team before the work goes ahead.',
  'Follow the regulator’s rules on availability of emergency services, and local practice, for this kind of work.',
  'Do not rely on the figures here alone: the risk numbers are estimates from a model, not a guarantee.',
] as const;

export function CriticalCaution({ title, lead, testID }: { title: string; lead: string; testID: string }) {
  return (
    <View style={styles.box} role="alert" testID={testID}>
      <Text style={styles.title}>{title}</Text>
      <Text style={styles.body}>{lead}</Text>
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
