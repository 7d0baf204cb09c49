// Said above the booking form when the slot finder filled it, so nobody takes the times for their own typing.
import { StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export function PrefillNote() {
  return (
    <View style={styles.box} testID="window-prefill-note">
      <Text style={styles.title}>Filled from the slot finder</Text>
      <Text style={styles.body}>The times, sites and spans come from the slot you picked. Check them, add a title and book.</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xxs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.primarySoft, borderLeftWidth: 4, borderLeftColor: colors.primary },
  title: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
});
