// The legend beside every list of severities and risk figures: what Low…Critical rate, and what the percentage is.
import { StyleSheet, Text, View } from 'react-native';
import { RISK_FIGURE_MEANING, SEVERITY_SCALE } from '@/components/impact/impact-format';
import { colors, space, type } from '@/constants/theme';

export function SeverityScale({ testID = 'severity-scale' }: { testID?: string }) {
  return (
    <View style={styles.box} testID={testID}>
      <Text style={styles.text}>{RISK_FIGURE_MEANING}</Text>
      <Text style={styles.text}>{SEVERITY_SCALE}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xxs },
  text: { ...type.caption, color: colors.inkMuted },
});
