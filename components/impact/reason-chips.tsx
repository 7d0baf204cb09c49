// Why a slice is affected, as small labelled chips (hosted, transit, squeezed, unprotected).
import { StyleSheet, Text, View } from 'react-native';
import type { AffectedSlice } from '@/shared/window-impact';
import { REASON_HINTS, REASON_LABELS } from '@/components/impact/impact-format';
import { colors, radii, space, type } from '@/constants/theme';

export function ReasonChips({ reasons }: { reasons: AffectedSlice['reasons'] }) {
  return (
    <View style={styles.row}>
      {reasons.map((reason) => (
        <Text key={reason} style={[styles.chip, reason === 'hosted' || reason === 'transit' ? styles.hard : styles.soft]} accessibilityLabel={`${REASON_LABELS[reason]}: ${REASON_HINTS[reason]}`}>
          {REASON_LABELS[reason]}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: { ...type.caption, paddingHorizontal: space.sm, paddingVertical: space.xxs, borderRadius: radii.pill, overflow: 'hidden' },
  hard: { color: colors.danger, backgroundColor: colors.dangerSoft },
  soft: { color: colors.warning, backgroundColor: colors.surfaceSunken },
});
