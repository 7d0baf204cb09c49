// The sites and spans a window takes out, each `down` or `reduced` to a share of its capacity, removable.
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { elementKey, type ElementEffect, type PickedElement } from '@/components/windows/window-form-state';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { ElementName } from '@/components/windows/element-name';
import { colors, radii, space, type } from '@/constants/theme';

const EFFECT_CHOICES = [
  { value: 'down', label: 'Down' },
  { value: 'reduced', label: 'Reduced' },
] as const;

type Props = {
  elements: readonly PickedElement[];
  onChange: (elements: PickedElement[]) => void;
  fractionErrors?: Record<string, string>;
  disabled?: boolean;
};

export function PickedElements({ elements, onChange, fractionErrors = {}, disabled = false }: Props) {
  const update = (key: string, patch: Partial<PickedElement>) =>
    onChange(elements.map((e) => (elementKey(e) === key ? { ...e, ...patch } : e)));
  if (elements.length === 0) return <Text style={styles.muted}>Nothing picked yet.</Text>;
  return (
    <View style={styles.list} testID="window-picked-elements">
      {elements.map((e) => {
        const key = elementKey(e);
        const error = fractionErrors[key];
        return (
          <View key={key} style={styles.row} testID={`window-picked-${e.id}`}>
            <View style={styles.head}>
              <View style={styles.headText}>
                {e.label === e.id ? <ElementName kind={e.kind} id={e.id} style={styles.name} /> : <Text style={styles.name}>{e.label}</Text>}
                <Text style={styles.muted}>{e.kind === 'site' ? 'Site' : 'Span'} · {e.id}</Text>
              </View>
              <Pressable role="button" accessibilityLabel={`Remove ${e.label}`} disabled={disabled} onPress={() => onChange(elements.filter((x) => elementKey(x) !== key))} style={styles.remove}>
                <Text style={styles.removeText}>Remove</Text>
              </Pressable>
            </View>
            <ChoiceChips
              label={`What happens to ${e.label}`}
              choices={EFFECT_CHOICES}
              value={e.effect}
              onChange={(value) => value && update(key, { effect: value as ElementEffect })}
              testID={`window-effect-${e.id}`}
              disabled={disabled}
            />
            {e.effect === 'reduced' ? (
              <View style={styles.fraction}>
                <Text style={styles.label}>Capacity left during the work (%)</Text>
                <TextInput
                  testID={`window-fraction-${e.id}`}
                  accessibilityLabel={`Capacity left on ${e.label}, in percent`}
                  value={e.percentText}
                  onChangeText={(percentText) => update(key, { percentText })}
                  inputMode="decimal"
                  placeholder="e.g. 40"
                  placeholderTextColor={colors.inkFaint}
                  editable={!disabled}
                  style={[styles.input, error ? styles.inputError : null]}
                />
                {error ? <Text style={styles.error} role="alert">{error}</Text> : null}
              </View>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { gap: space.sm, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  head: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  headText: { flex: 1 },
  name: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  remove: { paddingHorizontal: space.sm, paddingVertical: space.xs, minHeight: 36, justifyContent: 'center' },
  removeText: { ...type.label, color: colors.danger },
  fraction: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  input: {
    ...type.body, color: colors.ink, borderWidth: 1.5, borderColor: colors.borderControl, borderRadius: radii.md,
    paddingHorizontal: space.md, paddingVertical: space.sm, maxWidth: 140,
  },
  inputError: { borderColor: colors.danger },
  error: { ...type.caption, color: colors.danger },
});
