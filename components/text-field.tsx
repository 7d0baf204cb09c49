// A labelled text input with its error line below; the label doubles as the accessible name.
import { useState } from 'react';
import { StyleSheet, Text, TextInput, View, type TextInputProps } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = Omit<TextInputProps, 'style' | 'accessibilityLabel'> & {
  label: string;
  error?: string;
  testID: string;
};

export function TextField({ label, error, testID, onFocus, onBlur, ...inputProps }: Props) {
  const [focused, setFocused] = useState(false);
  const borderColor = error ? colors.danger : focused ? colors.primary : colors.borderControl;
  return (
    <View style={styles.field}>
      <Text style={styles.label} nativeID={`${testID}-label`}>
        {label}
      </Text>
      <TextInput
        {...inputProps}
        testID={testID}
        accessibilityLabel={label}
        aria-invalid={error ? true : undefined}
        onFocus={(event) => {
          setFocused(true);
          onFocus?.(event);
        }}
        onBlur={(event) => {
          setFocused(false);
          onBlur?.(event);
        }}
        placeholderTextColor={colors.inkFaint}
        style={[styles.input, { borderColor }]}
      />
      {error ? (
        <Text style={styles.error} testID={`${testID}-error`} role="alert">
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  input: {
    ...type.body,
    color: colors.ink,
    backgroundColor: colors.surface,
    borderWidth: 1.5,
    borderRadius: radii.md,
    paddingHorizontal: space.md,
    paddingVertical: space.sm + 2,
  },
  error: { ...type.caption, color: colors.danger },
});
