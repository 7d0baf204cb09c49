// The plan's risk class as a pill: high in the danger tone, low quiet.
import { StyleSheet, Text, View } from 'react-native';
import type { RiskClass } from '@/shared/signoff';
import { RISK_WORDS } from '@/components/signoff/signoff-words';
import { colors, radii, space, type } from '@/constants/theme';

export function RiskPill({ risk, testID }: { risk: RiskClass; testID?: string }) {
  const high = risk === 'high';
  return (
    <View style={[styles.pill, high ? styles.high : styles.low]} testID={testID}>
      <Text style={[styles.text, { color: high ? colors.danger : colors.inkMuted }]}>{RISK_WORDS[risk]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: { alignSelf: 'flex-start', borderRadius: radii.pill, paddingHorizontal: space.sm, paddingVertical: space.xxs, borderWidth: 1 },
  high: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  low: { backgroundColor: colors.surfaceSunken, borderColor: colors.border },
  text: { ...type.label },
});
