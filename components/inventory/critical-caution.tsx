// The caution every critical slice carries (DESIGN §7): people may depend on it, the tool's figures are not enough.
import { StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export const CRITICAL_CAUTION =
  'This slice carries a critical service (public safety, health or utilities). Before any work that touches it, ' +
  "coordinate with the service's own operations, follow the regulator's rules for emergency-service availability " +
  "and local practice, and do not rely on this tool's figures alone.";

export function CriticalCaution() {
  return (
    <View style={styles.box} role="alert" testID="critical-caution">
      <Text style={styles.title}>Critical service</Text>
      <Text style={styles.text}>{CRITICAL_CAUTION}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: colors.dangerSoft,
    borderLeftWidth: 4,
    borderLeftColor: colors.danger,
    borderRadius: radii.md,
    padding: space.md,
    gap: space.xs,
  },
  title: { ...type.bodyStrong, color: colors.danger },
  text: { ...type.body, color: colors.ink },
});
