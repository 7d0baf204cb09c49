// A state as a small pill: a coloured border and dot in the state's tone, and its label (windows, plan runs).
import { StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export function StatusPill({ label, tone, testID }: { label: string; tone: string; testID?: string }) {
  return (
    <View style={[styles.pill, { borderColor: tone }]} testID={testID}>
      <View style={[styles.dot, { backgroundColor: tone }]} />
      <Text style={styles.text}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: {
    flexDirection: 'row', alignItems: 'center', gap: space.xs, alignSelf: 'flex-start',
    borderWidth: 1.5, borderRadius: radii.pill, paddingHorizontal: space.sm, paddingVertical: space.xxs, backgroundColor: colors.surface,
  },
  dot: { width: 8, height: 8, borderRadius: radii.pill },
  text: { ...type.label, color: colors.ink },
});
