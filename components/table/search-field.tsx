// The table's search box: a labelled input with a clear action once something is typed.
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

type Props = { value: string; onChange: (text: string) => void; label: string; testID: string };

export function SearchField({ value, onChange, label, testID }: Props) {
  return (
    <View style={styles.box}>
      <TextInput
        testID={testID}
        value={value}
        onChangeText={onChange}
        placeholder={label}
        accessibilityLabel={label}
        placeholderTextColor={colors.inkFaint}
        autoCapitalize="none"
        autoCorrect={false}
        style={styles.input}
      />
      {value ? (
        <Pressable role="button" accessibilityLabel="Clear search" onPress={() => onChange('')} style={styles.clear}>
          <Text style={styles.clearText}>Clear</Text>
        </Pressable>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    flexDirection: 'row',
    alignItems: 'center',
    backgroundColor: colors.surface,
    borderWidth: 1.5,
    borderColor: colors.borderControl,
    borderRadius: radii.md,
    paddingLeft: space.md,
  },
  input: { ...type.body, flex: 1, color: colors.ink, paddingVertical: space.sm },
  clear: { paddingHorizontal: space.md, paddingVertical: space.sm },
  clearText: { ...type.label, color: colors.primary },
});
