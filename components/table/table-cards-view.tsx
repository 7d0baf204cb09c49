// Phone layout: sort chips above one card per item, the primary column as its title and the rest as labelled pairs.
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { ChipRow } from '@/components/chip-row';
import { Cell } from './cell';
import { sortMark, type RowsViewProps } from './table-columns-view';
import { isSortable } from './types';
import { colors, radii, space, type } from '@/constants/theme';

export function TableCardsView<T>(props: RowsViewProps<T>) {
  const { testID, rows, columns, rowKey, sort, onSortPress, onRowPress, selectedKey, body } = props;
  const title = columns.find((c) => c.primary) ?? columns[0];
  const fields = columns.filter((c) => c !== title && !c.hideInCards);
  const sortable = columns.filter(isSortable);
  return (
    <View style={styles.frame}>
      {sortable.length > 0 ? (
        <ChipRow testID={`${testID}-sort-strip`} backgroundColor={colors.tide} contentContainerStyle={styles.chips}>
          <Text style={styles.chipsLabel}>Sort</Text>
          {sortable.map((column) => {
            const active = sort?.key === column.key;
            return (
              <Pressable
                key={column.key}
                testID={`${testID}-sort-${column.key}`}
                role="button"
                accessibilityLabel={`Sort by ${column.label}`}
                aria-selected={active}
                onPress={() => onSortPress(column.key)}
                style={[styles.chip, active && styles.chipActive]}
              >
                <Text style={[styles.chipText, active && styles.chipTextActive]}>{`${column.label}${sortMark(sort, column.key)}`}</Text>
              </Pressable>
            );
          })}
        </ChipRow>
      ) : null}
      <ScrollView style={styles.body} contentContainerStyle={styles.list}>
        {body ??
          rows.map((row) => {
            const key = rowKey(row);
            return (
              <Pressable
                key={key}
                testID={`${testID}-row-${key}`}
                role={onRowPress ? 'button' : undefined}
                disabled={!onRowPress}
                onPress={onRowPress ? () => onRowPress(row) : undefined}
                style={({ pressed }) => [styles.card, key === selectedKey && styles.selected, pressed && styles.pressed]}
              >
                <Cell value={title.render(row)} strong />
                <View style={styles.fields}>
                  {fields.map((column) => (
                    <View key={column.key} style={styles.field}>
                      <Text style={styles.fieldLabel}>{column.label}</Text>
                      <Cell value={column.render(row)} />
                    </View>
                  ))}
                </View>
              </Pressable>
            );
          })}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1 },
  chips: { gap: space.sm, paddingVertical: space.sm },
  chipsLabel: { ...type.label, color: colors.inkMuted },
  chip: { paddingHorizontal: space.md, paddingVertical: space.xs + 2, borderRadius: radii.pill, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  chipActive: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  chipText: { ...type.label, color: colors.inkMuted },
  chipTextActive: { color: colors.primary },
  body: { flex: 1 },
  list: { gap: space.sm, paddingBottom: space.lg },
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    gap: space.xs,
  },
  selected: { borderColor: colors.buoy, borderWidth: 2 },
  pressed: { backgroundColor: colors.tide },
  fields: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  field: { minWidth: 90, flexGrow: 1, flexBasis: '28%', gap: 1 },
  fieldLabel: { ...type.caption, color: colors.inkMuted },
});
