// Wide layout: a real table (header row of column titles, one row per item). Sortable titles are buttons inside
// their column headers, which carry aria-sort; each row opens through its title cell.
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { Cell } from './cell';
import { ariaSort, OpenableRow, OpenTitle, SortTitle } from './row-parts';
import { isSortable, type Column, type SortState } from './types';
import { colors, space, type } from '@/constants/theme';

export type RowsViewProps<T> = {
  testID: string;
  /** What the table is called (read out when entering it). */
  label?: string;
  rows: readonly T[];
  columns: readonly Column<T>[];
  rowKey: (row: T) => string;
  sort: SortState | null;
  onSortPress: (key: string) => void;
  onRowPress?: (row: T) => void;
  selectedKey?: string | null;
  body: React.ReactNode | null;
};

/** The column whose cell names a row: the one marked primary, else the first. */
export function titleColumn<T>(columns: readonly Column<T>[]): Column<T> | undefined {
  return columns.find((c) => c.primary) ?? columns[0];
}

function HeaderCell<T>({ column, sort, onSortPress, testID }: { column: Column<T>; sort: SortState | null; onSortPress: (key: string) => void; testID: string }) {
  const active = sort?.key === column.key;
  const textStyle = [styles.headText, active && styles.headActive, column.align === 'end' && styles.end];
  return (
    <View role="columnheader" aria-sort={ariaSort(sort, column.key)} style={[styles.headCell, { flex: column.flex ?? 1 }]}>
      {isSortable(column) ? (
        <Pressable testID={`${testID}-sort-${column.key}`} role="button" onPress={() => onSortPress(column.key)} style={styles.sortButton}>
          <SortTitle label={column.label} sort={sort} columnKey={column.key} style={textStyle} />
        </Pressable>
      ) : (
        <SortTitle label={column.label} sort={null} columnKey={column.key} style={textStyle} />
      )}
    </View>
  );
}

export function TableColumnsView<T>(props: RowsViewProps<T>) {
  const { testID, label, rows, columns, rowKey, sort, onSortPress, onRowPress, selectedKey, body } = props;
  const title = titleColumn(columns);
  return (
    <View style={styles.frame}>
      <View role="table" aria-label={label} style={body ? undefined : styles.table} testID={`${testID}-grid`}>
        <View role="rowgroup">
          <View style={styles.header} role="row">
            {columns.map((column) => (
              <HeaderCell key={column.key} column={column} sort={sort} onSortPress={onSortPress} testID={testID} />
            ))}
          </View>
        </View>
        {body ? null : (
          <ScrollView style={styles.body}>
            <View role="rowgroup">
              {rows.map((row) => {
                const key = rowKey(row);
                const open = key === selectedKey;
                const onOpen = onRowPress ? () => onRowPress(row) : undefined;
                return (
                  <OpenableRow
                    key={key}
                    testID={`${testID}-row-${key}`}
                    role="row"
                    open={open}
                    onOpen={onOpen}
                    looks={{ base: styles.row, selected: styles.selected, pressed: styles.pressed }}
                  >
                    {columns.map((column) => (
                      <View key={column.key} role="cell" style={[styles.cell, { flex: column.flex ?? 1 }, column.align === 'end' && styles.cellEnd]}>
                        {column === title ? (
                          <OpenTitle tableTestID={testID} rowKey={key} open={open} onOpen={onOpen} style={styles.titleCell}>
                            <Cell value={column.render(row)} strong={column.primary} align={column.align} />
                          </OpenTitle>
                        ) : (
                          <Cell value={column.render(row)} strong={column.primary} align={column.align} />
                        )}
                      </View>
                    ))}
                  </OpenableRow>
                );
              })}
            </View>
          </ScrollView>
        )}
      </View>
      {body ? <ScrollView style={styles.body}>{body}</ScrollView> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { flex: 1, backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border, borderRadius: 14, overflow: 'hidden' },
  table: { flex: 1 },
  header: { flexDirection: 'row', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.sm, backgroundColor: colors.surfaceSunken },
  headCell: { justifyContent: 'center' },
  sortButton: { alignSelf: 'stretch' },
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
  selected: { backgroundColor: colors.primarySoft, borderLeftColor: colors.buoyDeep },
  pressed: { backgroundColor: colors.tide },
  cell: { justifyContent: 'center' },
  cellEnd: { alignItems: 'flex-end' },
  titleCell: { gap: space.xxs, alignItems: 'flex-start' },
});
