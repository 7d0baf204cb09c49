// After an import is applied: straight on to the network and the slices it changed.
import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { colors, space, type } from '@/constants/theme';

export function AppliedLinks() {
  return (
    <View style={styles.links}>
      <Link href="/network" style={styles.link} testID="import-open-network">Open the network</Link>
      <Link href="/slices" style={styles.link}>Open the slices</Link>
    </View>
  );
}

const styles = StyleSheet.create({
  links: { flexDirection: 'row', gap: space.lg, flexWrap: 'wrap' },
  link: { ...type.bodyStrong, color: colors.primary },
});
