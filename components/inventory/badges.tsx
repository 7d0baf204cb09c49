// Small labels beside names: critical slices, fixed functions, the current revision, service types.
import { StyleSheet, Text } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Tone = 'danger' | 'primary' | 'muted';

export function Badge({ label, tone = 'muted', testID }: { label: string; tone?: Tone; testID?: string }) {
  return (
    <Text style={[styles.badge, styles[tone]]} testID={testID}>
      {label}
    </Text>
  );
}

export function CriticalBadge({ testID }: { testID?: string }) {
  return <Badge label="Critical" tone="danger" testID={testID} />;
}

const styles = StyleSheet.create({
  badge: {
    ...type.label,
    paddingHorizontal: space.sm,
    paddingVertical: 1,
    borderRadius: radii.pill,
    overflow: 'hidden',
    alignSelf: 'flex-start',
  },
  danger: { color: colors.danger, backgroundColor: colors.dangerSoft },
  primary: { color: colors.primary, backgroundColor: colors.primarySoft },
  muted: { color: colors.inkMuted, backgroundColor: colors.surfaceSunken },
});
