// State for a table whose rows are all on the client: search text and sort, applied with the pure helpers.
import { useMemo, useState } from 'react';
import { filterRows, sortRows } from './table-logic';
import type { Column, SortState } from './types';

export function useClientTable<T>(
  rows: readonly T[],
  columns: readonly Column<T>[],
  searchText: (row: T) => string,
  initialSort: SortState | null = null,
) {
  const [query, setQuery] = useState('');
  const [sort, setSort] = useState<SortState | null>(initialSort);
  const visible = useMemo(
    () => sortRows(filterRows(rows, query, searchText), columns, sort),
    [rows, columns, query, searchText, sort],
  );
  return { rows: visible, query, setQuery, sort, setSort };
}
