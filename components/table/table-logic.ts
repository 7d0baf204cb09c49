// Pure helpers behind client-side tables: search, sort and the next sort state when a header is pressed.
import type { Column, SortState } from './types';

/** Case- and accent-insensitive: "Aberdale" matches "aberdale" and "ÀBERDALE". */
function fold(text: string): string {
  return text.normalize('NFD').replace(/[\u0300-\u036f]/g, '').toLowerCase();
}

/** Rows whose search text contains every word of the query; an empty query keeps every row. */
export function filterRows<T>(rows: readonly T[], query: string, searchText: (row: T) => string): T[] {
  const words = fold(query).split(/\s+/).filter(Boolean);
  if (words.length === 0) return [...rows];
  return rows.filter((row) => {
    const haystack = fold(searchText(row));
    return words.every((word) => haystack.includes(word));
  });
}

function compareValues(a: string | number | null | undefined, b: string | number | null | undefined): number {
  // Missing values sort last whatever the order, so blanks never crowd the top of a list.
  if (a === null || a === undefined) return b === null || b === undefined ? 0 : 1;
  if (b === null || b === undefined) return -1;
  if (typeof a === 'number' && typeof b === 'number') return a - b;
  return String(a).localeCompare(String(b), undefined, { numeric: true, sensitivity: 'base' });
}

/** A stable sort by the column's sortValue; unknown keys or columns without a sortValue leave the order alone. */
export function sortRows<T>(rows: readonly T[], columns: readonly Column<T>[], sort: SortState | null): T[] {
  const column = sort ? columns.find((c) => c.key === sort.key) : undefined;
  if (!sort || !column?.sortValue) return [...rows];
  const value = column.sortValue;
  const sign = sort.order === 'asc' ? 1 : -1;
  return rows
    .map((row, index) => ({ row, index }))
    .sort((x, y) => {
      const a = value(x.row);
      const b = value(y.row);
      const missing = a === null || a === undefined || b === null || b === undefined;
      const byValue = missing ? compareValues(a, b) : sign * compareValues(a, b);
      return byValue !== 0 ? byValue : x.index - y.index;
    })
    .map(({ row }) => row);
}

/** Pressing a header: a new column sorts ascending, the same column flips its order. */
export function nextSort(current: SortState | null, key: string): SortState {
  if (current?.key === key) return { key, order: current.order === 'asc' ? 'desc' : 'asc' };
  return { key, order: 'asc' };
}
