// Above the booking form: when the slot finder filled it, a note saying so (nobody takes the times for their own
// typing); otherwise a way to the finder for someone who does not know when yet.
import { StyleSheet, Text, View } from 'react-native';
import { Button } from '@/components/button';
import { colors, radii, space, type } from '@/constants/theme';

export function PrefillNote() {
  return (
    <View style={styles.box} testID="window-prefill-note">
      <Text style={styles.title}>Filled from the slot finder</Text>
      <Text style={styles.body}>The times, sites and spans come from the slot you picked. Check them, add a title and book.</Text>
    </View>
  );
}

export function FindSlotHint({ onPress }: { onPress: () => void }) {
  return (
    <View style={styles.hint}>
      <Text style={styles.body}>Not sure when? The slot finder ranks the nights that hurt least.</Text>
      <Button label="Find a slot" variant="quiet" onPress={onPress} testID="window-find-slot" />
    </View>
  );
}

const styles = StyleSheet.create({
  hint: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  box: { gap: space.xxs, padding: space.md, borderRadius: radii.md, backgroundColor: colors.primarySoft, borderLeftWidth: 4, borderLeftColor: colors.primary },
  title: { ...type.bodyStrong, color: colors.ink },
  body: { ...type.body, color: colors.ink },
});
