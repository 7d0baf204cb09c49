// A plain table for the pack: a header row of column titles and one row per item, with table roles so screen
// readers and the print stylesheet (rows never split across pages) see rows and cells.
import { StyleSheet, Text, View } from 'react-native';
import { colors, space, type } from '@/constants/theme';

export type PackColumn = { label: string; flex?: number };
export type PackRow = { key: string; testID: string; cells: readonly string[] };

export function PackTable({ label, columns, rows, testID }: { label: string; columns: readonly PackColumn[]; rows: readonly PackRow[]; testID: string }) {
  return (
    <View role="table" aria-label={label} testID={testID}>
      <View role="rowgroup">
        <View role="row" style={[styles.row, styles.head]}>
          {columns.map((c) => (
            <View key={c.label} role="columnheader" style={[styles.cell, { flex: c.flex ?? 1 }]}>
              <Text style={styles.headText}>{c.label}</Text>
            </View>
          ))}
        </View>
      </View>
      <View role="rowgroup">
        {rows.map((row) => (
          <View key={row.key} role="row" style={styles.row} testID={row.testID}>
            {row.cells.map((text, i) => (
              <View key={columns[i]?.label ?? i} role="cell" style={[styles.cell, { flex: columns[i]?.flex ?? 1 }]}>
                <Text style={styles.body}>{text}</Text>
              </View>
            ))}
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', borderBottomWidth: 1, borderColor: colors.border },
  head: { borderBottomWidth: 2, borderColor: colors.ink },
  cell: { paddingVertical: space.xs, paddingRight: space.sm, minWidth: 0 },
  headText: { ...type.label, color: colors.ink },
  body: { ...type.caption, color: colors.ink },
});
