// The detail pane on wide screens before anything is picked.
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '@/constants/theme';

export function DetailPlaceholder({ title, hint }: { title: string; hint: string }) {
  return (
    <View style={styles.box} testID="detail-placeholder">
      <Text style={styles.title}>{title}</Text>
      <Text style={styles.hint}>{hint}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.sm, padding: space.xl },
  title: { ...type.heading, color: colors.ink, textAlign: 'center' },
  hint: { ...type.body, color: colors.inkMuted, textAlign: 'center', maxWidth: 380 },
});
