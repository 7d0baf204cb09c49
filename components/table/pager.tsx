// Paging under a server-driven table: "21–40 of 112" with previous/next.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { page: number; pageSize: number; total: number; onPageChange: (page: number) => void; testID: string };

export function Pager({ page, pageSize, total, onPageChange, testID }: Props) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  if (pages <= 1) return null;
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <View style={styles.row} testID={testID}>
      <PagerButton label="Previous" disabled={page <= 1} onPress={() => onPageChange(page - 1)} testID={`${testID}-prev`} />
      <Text style={styles.text}>
        {first}–{last} of {total}
      </Text>
      <PagerButton label="Next" disabled={page >= pages} onPress={() => onPageChange(page + 1)} testID={`${testID}-next`} />
    </View>
  );
}

function PagerButton({ label, disabled, onPress, testID }: { label: string; disabled: boolean; onPress: () => void; testID: string }) {
  return (
    <Pressable
      testID={testID}
      role="button"
      disabled={disabled}
      aria-disabled={disabled}
      onPress={onPress}
      style={[styles.button, disabled && styles.disabled]}
    >
      <Text style={styles.buttonText}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md, paddingVertical: space.sm },
  text: { ...type.caption, color: colors.inkMuted },
  button: { paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border },
  disabled: { opacity: 0.4 },
  buttonText: { ...type.label, color: colors.primary },
});
