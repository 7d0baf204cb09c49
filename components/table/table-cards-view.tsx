// Phone layout: a "Sort by" choice above a list of cards, the title column as each card's title (and the control
// that opens it) and the rest as labelled pairs.
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { ChipRow } from '@/components/chip-row';
import { useRovingChoice } from '@/components/roving-focus';
import { Cell } from './cell';
import { OpenableRow, OpenTitle, SortTitle } from './row-parts';
import { titleColumn, type RowsViewProps } from './table-columns-view';
import { isSortable, type Column, type SortState } from './types';
import { colors, radii, space, type } from '@/constants/theme';

/** A sort choice's name: its visible title, then the order when it is the chosen one. */
export function sortChoiceName(label: string, sort: SortState | null, key: string): string {
  if (sort?.key !== key) return label;
  return `${label}, ${sort.order === 'asc' ? 'ascending' : 'descending'}`;
}

/** One radio per sortable column; choosing the chosen one again reverses the order. */
function SortChoices<T>({ sortable, sort, onSortPress, testID }: { sortable: Column<T>[]; sort: SortState | null; onSortPress: (key: string) => void; testID: string }) {
  const itemProps = useRovingChoice(sortable.length, sortable.findIndex((c) => c.key === sort?.key), (index) => {
    const column = sortable[index];
    if (column) onSortPress(column.key);
  });
  return (
    <View style={styles.sortRow}>
      <Text style={styles.chipsLabel} aria-hidden>Sort by</Text>
      <View style={styles.sortStrip}>
        <ChipRow testID={`${testID}-sort-strip`} backgroundColor={colors.tide} contentContainerStyle={styles.chips} role="radiogroup" label="Sort by">
          {sortable.map((column, index) => {
            const active = sort?.key === column.key;
            return (
              <Pressable
                key={column.key}
                testID={`${testID}-sort-${column.key}`}
                role="radio"
                aria-checked={active}
                accessibilityLabel={sortChoiceName(column.label, sort, column.key)}
                onPress={() => onSortPress(column.key)}
                style={[styles.chip, active && styles.chipActive]}
                {...itemProps(index)}
              >
                <SortTitle label={column.label} sort={sort} columnKey={column.key} style={[styles.chipText, active && styles.chipTextActive]} />
              </Pressable>
            );
          })}
        </ChipRow>
      </View>
    </View>
  );
}

export function TableCardsView<T>(props: RowsViewProps<T>) {
  const { testID, label, rows, columns, rowKey, sort, onSortPress, onRowPress, selectedKey, body } = props;
  const title = titleColumn(columns);
  const fields = columns.filter((c) => c !== title && !c.hideInCards);
  const sortable = columns.filter(isSortable);
  return (
    <View style={styles.frame}>
      {sortable.length > 0 ? <SortChoices sortable={sortable} sort={sort} onSortPress={onSortPress} testID={testID} /> : null}
      <ScrollView style={styles.body} contentContainerStyle={styles.scroll}>
        {body ?? (
          <View role="list" aria-label={label} style={styles.list} testID={`${testID}-list`}>
            {rows.map((row) => {
              const key = rowKey(row);
              const open = key === selectedKey;
              const onOpen = onRowPress ? () => onRowPress(row) : undefined;
              return (
                <OpenableRow
                  key={key}
                  testID={`${testID}-row-${key}`}
                  role="listitem"
                  open={open}
                  onOpen={onOpen}
                  looks={{ base: styles.card, selected: styles.selected, pressed: styles.pressed }}
                >
                  {title ? (
                    <OpenTitle tableTestID={testID} rowKey={key} open={open} onOpen={onOpen} style={styles.titleLine}>
                      <Cell value={title.render(row)} strong />
                    </OpenTitle>
                  ) : null}
                  <View style={styles.fields}>
                    {fields.map((column) => (
                      <View key={column.key} style={styles.field}>
                        <Text style={styles.fieldLabel}>{column.label}</Text>
                        <Cell value={column.render(row)} />
                      </View>
                    ))}
                  </View>
                </OpenableRow>
              );
            })}
          </View>
        )}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1 },
  sortRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  sortStrip: { flex: 1 },
  chips: { gap: space.sm, paddingVertical: space.sm },
  chipsLabel: { ...type.label, color: colors.inkMuted },
  chip: { paddingHorizontal: space.md, paddingVertical: space.xs + 2, borderRadius: radii.pill, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  chipActive: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
  chipText: { ...type.label, color: colors.inkMuted },
  chipTextActive: { color: colors.primary },
  body: { flex: 1 },
  scroll: { paddingBottom: space.lg },
  list: { gap: space.sm },
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    paddingHorizontal: space.md,
    paddingVertical: space.sm,
    gap: space.xs,
  },
  // Wider border and a bar on the leading edge: the open card differs by shape too, not by colour alone.
  selected: { borderColor: colors.buoyDeep, borderWidth: 2, borderLeftWidth: 6 },
  pressed: { backgroundColor: colors.tide },
  titleLine: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  fields: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  field: { minWidth: 90, flexGrow: 1, flexBasis: '28%', gap: 1 },
  fieldLabel: { ...type.caption, color: colors.inkMuted },
});
