// The sites and spans a window takes out, each `down` or `reduced` to a share of its capacity, removable; each by its
// name and what tells it apart (kind, compute and place; capacity and length), never by its id.
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { elementKey, type ElementEffect, type PickedElement } from '@/components/windows/window-form-state';
import { ChoiceChips } from '@/components/windows/choice-chips';
import { useElementWords } from '@/components/windows/element-name';
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

type RowProps = {
  element: PickedElement;
  error?: string;
  disabled: boolean;
  onPatch: (patch: Partial<PickedElement>) => void;
  onRemove: () => void;
};

function PickedRow({ element: e, error, disabled, onPatch, onRemove }: RowProps) {
  // Picked from the search: its words came with it. Loaded with a saved window: looked up (the label may be an id).
  const known = e.detail !== undefined && e.label !== e.id ? { name: e.label, detail: e.detail } : undefined;
  const words = useElementWords(e.kind, e.id, known);
  return (
    <View style={styles.row} testID={`window-picked-${e.id}`}>
      <View style={styles.head}>
        <View style={styles.headText}>
          <Text style={styles.name} testID={`window-picked-${e.id}-name`}>{words.name}</Text>
          {words.detail ? <Text style={styles.muted} testID={`window-picked-${e.id}-detail`}>{words.detail}</Text> : null}
        </View>
        <Pressable role="button" accessibilityLabel={`Remove ${words.name}`} disabled={disabled} onPress={onRemove} style={styles.remove}>
          <Text style={styles.removeText}>Remove</Text>
        </Pressable>
      </View>
      <ChoiceChips
        label={`What happens to ${words.name}`}
        choices={EFFECT_CHOICES}
        value={e.effect}
        onChange={(value) => value && onPatch({ effect: value as ElementEffect })}
        testID={`window-effect-${e.id}`}
        disabled={disabled}
      />
      {e.effect === 'reduced' ? (
        <View style={styles.fraction}>
          <Text style={styles.label}>Capacity left during the work (%)</Text>
          <TextInput
            testID={`window-fraction-${e.id}`}
            accessibilityLabel={`Capacity left on ${words.name}, in percent`}
            value={e.percentText}
            onChangeText={(percentText) => onPatch({ percentText })}
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
}

export function PickedElements({ elements, onChange, fractionErrors = {}, disabled = false }: Props) {
  const update = (key: string, patch: Partial<PickedElement>) =>
    onChange(elements.map((e) => (elementKey(e) === key ? { ...e, ...patch } : e)));
  if (elements.length === 0) return <Text style={styles.muted}>Nothing picked yet.</Text>;
  return (
    <View style={styles.list} testID="window-picked-elements">
      {elements.map((e) => {
        const key = elementKey(e);
        return (
          <PickedRow
            key={key}
            element={e}
            error={fractionErrors[key]}
            disabled={disabled}
            onPatch={(patch) => update(key, patch)}
            onRemove={() => onChange(elements.filter((x) => elementKey(x) !== key))}
          />
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
