// The detail pane before anything is picked: the whole network map with a line on what to do.
import { StyleSheet, Text, View } from 'react-native';
import { InventoryMap } from '@/components/inventory/inventory-map';
import { colors, space, type } from '@/constants/theme';

export function InventoryMapPane() {
  return (
    <View style={styles.pane} testID="network-map-pane">
      <Text style={styles.hint}>Pick a site or span in the list, or tap one on the map.</Text>
      <View style={styles.map}>
        <InventoryMap />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  pane: { flex: 1, padding: space.lg, gap: space.sm },
  hint: { ...type.body, color: colors.inkMuted },
  map: { flex: 1 },
});
