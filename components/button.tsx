// The primary action button; shows a spinner and ignores presses while busy or disabled.
import { ActivityIndicator, Pressable, StyleSheet, Text } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = {
  label: string;
  onPress: () => void;
  testID?: string;
  disabled?: boolean;
  busy?: boolean;
  variant?: 'primary' | 'quiet';
};

export function Button({ label, onPress, testID, disabled = false, busy = false, variant = 'primary' }: Props) {
  const inactive = disabled || busy;
  const primary = variant === 'primary';
  return (
    <Pressable
      testID={testID}
      role="button"
      accessibilityLabel={label}
      accessibilityState={{ disabled: inactive, busy }}
      aria-disabled={inactive}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed }) => [
        styles.base,
        primary ? styles.primary : styles.quiet,
        pressed && (primary ? styles.primaryPressed : styles.quietPressed),
        inactive && styles.inactive,
      ]}
    >
      {busy ? <ActivityIndicator size="small" color={primary ? colors.onPrimary : colors.primary} aria-label="Working" /> : null}
      <Text style={[styles.label, { color: primary ? colors.onPrimary : colors.primary }]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
    borderRadius: radii.md,
    paddingVertical: space.md,
    paddingHorizontal: space.lg,
    minHeight: 44,
  },
  primary: { backgroundColor: colors.primary },
  primaryPressed: { backgroundColor: colors.primaryPressed },
  quiet: { backgroundColor: 'transparent', borderWidth: 1, borderColor: colors.border },
  quietPressed: { backgroundColor: colors.primarySoft },
  inactive: { opacity: 0.6 },
  label: { ...type.bodyStrong },
});
