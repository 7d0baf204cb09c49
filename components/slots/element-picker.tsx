// The sites and spans a slot's work (or a campaign group) takes out: the picked ones, removable, and the booking
// form's search to add more. Everything is taken out whole here; a reduced capacity is set when booking.
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { ElementName } from '@/components/windows/element-name';
import { ElementSearch } from '@/components/windows/element-search';
import { colors, radii, space, type } from '@/constants/theme';
import type { SlotElement } from './slot-form-state';

type Props = { elements: readonly SlotElement[]; onChange: (elements: SlotElement[]) => void; disabled: boolean; testID: string };

const keyOf = (e: Pick<SlotElement, 'kind' | 'id'>) => `${e.kind}:${e.id}`;

export function SlotElementPicker({ elements, onChange, disabled, testID }: Props) {
  return (
    <View style={styles.box}>
      {elements.length === 0 ? <Text style={styles.muted}>Nothing picked yet.</Text> : (
        <View style={styles.list} testID={`${testID}-picked`}>
          {elements.map((e) => (
            <View key={keyOf(e)} style={styles.row} testID={`${testID}-picked-${e.id}`}>
              <View style={styles.text}>
                {e.label === e.id ? <ElementName kind={e.kind} id={e.id} style={styles.name} /> : <Text style={styles.name}>{e.label}</Text>}
                <Text style={styles.muted}>{e.kind === 'site' ? 'Site' : 'Span'} · down for the work</Text>
              </View>
              <Pressable role="button" accessibilityLabel={`Remove ${e.label}`} disabled={disabled} style={styles.remove}
                onPress={() => onChange(elements.filter((x) => keyOf(x) !== keyOf(e)))}>
                <Text style={styles.removeText}>Remove</Text>
              </Pressable>
            </View>
          ))}
        </View>
      )}
      <ElementSearch
        pickedKeys={new Set(elements.map(keyOf))}
        disabled={disabled}
        onPick={(o) => onChange([...elements, { kind: o.kind, id: o.id, label: o.label }])}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  list: { gap: space.xs },
  row: {
    flexDirection: 'row', alignItems: 'center', gap: space.sm, padding: space.sm, minHeight: 44,
    borderRadius: radii.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface,
  },
  text: { flex: 1 },
  name: { ...type.bodyStrong, color: colors.ink },
  muted: { ...type.caption, color: colors.inkMuted },
  remove: { paddingHorizontal: space.sm, minHeight: 44, justifyContent: 'center' },
  removeText: { ...type.label, color: colors.danger },
});
