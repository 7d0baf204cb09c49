// A slice's severity in the window, from quiet (low) to loud (critical).
import { StyleSheet, Text } from 'react-native';
import type { AffectedSlice } from '@/shared/window-impact';
import { calendarColors, colors, radii, space, type } from '@/constants/theme';

const TONES: Record<AffectedSlice['severity'], { color: string; backgroundColor: string }> = {
  low: { color: colors.inkMuted, backgroundColor: colors.surfaceSunken },
  medium: { color: calendarColors.critical, backgroundColor: calendarColors.criticalSoft },
  high: { color: colors.danger, backgroundColor: colors.dangerSoft },
  critical: { color: colors.onPrimary, backgroundColor: colors.danger },
};

export function SeverityPill({ severity }: { severity: AffectedSlice['severity'] }) {
  return <Text style={[styles.pill, TONES[severity]]}>{severity[0].toUpperCase() + severity.slice(1)}</Text>;
}

const styles = StyleSheet.create({
  pill: { ...type.label, alignSelf: 'flex-start', paddingHorizontal: space.sm, paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
});
