// A multi-choice chip list (pinned functions, sites left out) of toggle buttons, with a filter once the list is long.
import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, View } from 'react-native';
import { colors, radii, space, type } from '@/constants/theme';

export type PickOption = { id: string; label: string };

type Props = {
  label: string;
  hint: string;
  options: readonly PickOption[];
  picked: readonly string[];
  onChange: (picked: string[]) => void;
  testID: string;
  error?: string;
  /** the options are still being fetched */
  loading?: boolean;
};

/** Past this many options a filter field appears, so a phone never scrolls through every site. */
const FILTER_FROM_OPTIONS = 12;
/** Chips shown while nothing is typed; the picked ones always show. */
const UNFILTERED_SHOWN = 12;

export function PickChips({ label, hint, options, picked, onChange, testID, error, loading = false }: Props) {
  const [filter, setFilter] = useState('');
  const shown = useMemo(() => {
    const needle = filter.trim().toLowerCase();
    if (needle !== '') return options.filter((o) => `${o.label} ${o.id}`.toLowerCase().includes(needle));
    const pickedFirst = [...options.filter((o) => picked.includes(o.id)), ...options.filter((o) => !picked.includes(o.id))];
    return pickedFirst.slice(0, Math.max(UNFILTERED_SHOWN, picked.length));
  }, [filter, options, picked]);
  const toggle = (id: string) => onChange(picked.includes(id) ? picked.filter((p) => p !== id) : [...picked, id]);
  return (
    <View style={styles.field} testID={testID}>
      <Text style={styles.label}>{label}{picked.length > 0 ? ` (${picked.length})` : ''}</Text>
      <Text style={styles.hint}>{hint}</Text>
      {options.length > FILTER_FROM_OPTIONS ? (
        <TextInput
          value={filter}
          onChangeText={setFilter}
          placeholder={`Filter ${options.length}…`}
          placeholderTextColor={colors.inkFaint}
          accessibilityLabel={`Filter: ${label}`}
          testID={`${testID}-filter`}
          style={styles.filter}
        />
      ) : null}
      {options.length === 0 ? <Text style={styles.hint}>{loading ? 'Loading the choices…' : 'Nothing to choose from.'}</Text> : null}
      {filter.trim() === '' && shown.length < options.length ? (
        <Text style={styles.hint}>Showing {shown.length} of {options.length}; type to find the others.</Text>
      ) : null}
      <View style={styles.row}>
        {shown.map((option) => {
          const on = picked.includes(option.id);
          return (
            <Pressable
              key={option.id}
              role="button"
              aria-pressed={on}
              testID={`${testID}-${option.id}`}
              onPress={() => toggle(option.id)}
              style={[styles.chip, on && styles.on]}
            >
              <Text style={[styles.text, on && styles.onText]}>
                {on ? <Text aria-hidden>{'✓ '}</Text> : null}
                {option.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
      {error ? <Text style={styles.error} role="alert" testID={`${testID}-error`}>{error}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.label, color: colors.ink },
  hint: { ...type.caption, color: colors.inkMuted },
  filter: {
    ...type.body, color: colors.ink, borderWidth: 1, borderColor: colors.borderControl, borderRadius: radii.md,
    paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.surface,
  },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: {
    borderWidth: 1.5, borderColor: colors.border, borderRadius: radii.pill, paddingHorizontal: space.md,
    paddingVertical: space.xs + 2, backgroundColor: colors.surface, minHeight: 36, justifyContent: 'center',
  },
  on: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  text: { ...type.label, color: colors.ink },
  onText: { color: colors.primary },
  error: { ...type.caption, color: colors.danger },
});
