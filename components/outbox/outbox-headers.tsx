// A message's header fields as label/value rows; long address lists wrap instead of running off the pane.
import { StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export function OutboxHeaders({ rows }: { rows: { label: string; value: string }[] }) {
  return (
    <View style={styles.box} testID="outbox-headers">
      {rows.map(({ label, value }) => (
        <View key={label} style={styles.row}>
          <Text style={styles.label}>{label}</Text>
          <Text style={styles.value} selectable>
            {value}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, backgroundColor: colors.tide, borderRadius: radii.lg, padding: space.md },
  row: { flexDirection: 'row', gap: space.md },
  label: { ...type.caption, color: colors.inkMuted, width: 64, paddingTop: 3 },
  value: { ...type.body, color: colors.ink, flex: 1, flexShrink: 1 },
});
