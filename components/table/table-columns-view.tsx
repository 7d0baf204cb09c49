// Wide layout: a header row of sortable column titles above one row per item.
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { Cell } from './cell';
import { isSortable, type Column, type SortState } from './types';
import { colors, space, type } from '@/constants/theme';

export type RowsViewProps<T> = {
  testID: string;
  rows: readonly T[];
  columns: readonly Column<T>[];
  rowKey: (row: T) => string;
  sort: SortState | null;
  onSortPress: (key: string) => void;
  onRowPress?: (row: T) => void;
  selectedKey?: string | null;
  body: React.ReactNode | null;
};

export function sortMark(sort: SortState | null, key: string): string {
  if (sort?.key !== key) return '';
  return sort.order === 'asc' ? ' ▲' : ' ▼';
}

export function TableColumnsView<T>(props: RowsViewProps<T>) {
  const { testID, rows, columns, rowKey, sort, onSortPress, onRowPress, selectedKey, body } = props;
  return (
    <View style={styles.frame}>
      <View style={styles.header} role="row">
        {columns.map((column) => {
          const active = sort?.key === column.key;
          const label = `${column.label}${sortMark(sort, column.key)}`;
          const style = [styles.headCell, { flex: column.flex ?? 1 }];
          if (!isSortable(column)) {
            return <Text key={column.key} style={[style, styles.headText, column.align === 'end' && styles.end]}>{column.label}</Text>;
          }
          return (
            <Pressable
              key={column.key}
              testID={`${testID}-sort-${column.key}`}
              role="button"
              accessibilityLabel={`Sort by ${column.label}`}
              aria-sort={active ? (sort?.order === 'asc' ? 'ascending' : 'descending') : undefined}
              onPress={() => onSortPress(column.key)}
              style={style}
            >
              <Text style={[styles.headText, active && styles.headActive, column.align === 'end' && styles.end]}>{label}</Text>
            </Pressable>
          );
        })}
      </View>
      <ScrollView style={styles.body}>
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
                style={({ pressed }) => [styles.row, key === selectedKey && styles.selected, pressed && styles.pressed]}
              >
                {columns.map((column) => (
                  <View key={column.key} style={[styles.cell, { flex: column.flex ?? 1 }, column.align === 'end' && styles.cellEnd]}>
                    <Cell value={column.render(row)} strong={column.primary} align={column.align} />
                  </View>
                ))}
              </Pressable>
            );
          })}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: 14, overflow: 'hidden' },
  header: { flexDirection: 'row', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.sm, backgroundColor: colors.surfaceSunken },
  headCell: { justifyContent: 'center' },
  headText: { ...type.label, color: colors.inkMuted },
  headActive: { color: colors.primary },
  end: { textAlign: 'right' },
  body: { flex: 1 },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.lg,
    paddingVertical: space.md,
    borderBottomWidth: 1,
    borderBottomColor: colors.surfaceSunken,
    borderLeftWidth: 3,
    borderLeftColor: 'transparent',
  },
  selected: { backgroundColor: colors.primarySoft, borderLeftColor: colors.buoy },
  pressed: { backgroundColor: colors.tide },
  cell: { justifyContent: 'center' },
  cellEnd: { alignItems: 'flex-end' },
});
