// State for a table that the API sorts, searches and pages: typed text is sent after a short pause,
// and any change of search or sort goes back to the first page.
import { useEffect, useState } from 'react';
import type { SortState } from './types';

/** Pause after the last keystroke before the search goes to the server. */
export const SEARCH_DEBOUNCE_MS = 300;

export function useServerTable(initialSort: SortState) {
  const [query, setQueryText] = useState('');
  const [debounced, setDebounced] = useState('');
  const [sort, setSortState] = useState<SortState>(initialSort);
  const [page, setPage] = useState(1);

  useEffect(() => {
    const timer = setTimeout(() => {
      setDebounced(query.trim());
      setPage(1);
    }, SEARCH_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [query]);

  const setSort = (next: SortState) => {
    setSortState(next);
    setPage(1);
  };
  return { query, setQuery: setQueryText, q: debounced || undefined, sort, setSort, page, setPage };
}

/** Narrows a pressed column key to the API's sort keys; columns the API cannot sort fall back. */
export function sortKeyIn<K extends string>(keys: readonly K[], key: string, fallback: K): K {
  return (keys as readonly string[]).includes(key) ? (key as K) : fallback;
}

type ServerTable = ReturnType<typeof useServerTable>;
interface ListQuery<T> {
  data?: { items: T[] };
  isError: boolean;
  error: { message: string } | null;
  refetch: () => unknown;
}

/** The DataTable props every API-backed list shares: its rows, sort and search state, and load status. */
export function serverTableProps<T>(table: ServerTable, list: ListQuery<T>) {
  const data = list.data;
  return {
    rows: data?.items ?? [],
    sort: table.sort,
    onSortChange: table.setSort,
    query: table.query,
    onQueryChange: table.setQuery,
    status: (list.isError && !data ? 'error' : !data ? 'loading' : 'ready') as 'error' | 'loading' | 'ready',
    errorMessage: list.error?.message,
    onRetry: () => { void list.refetch(); },
  };
}
