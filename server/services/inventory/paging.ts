// In-memory search, sort and paging for inventory lists (the whole inventory is loaded per request anyway).
type Sortable = string | number | boolean | null;

export interface PageQuery<K extends string> {
  page: number;
  pageSize: number;
  sort: K;
  order: 'asc' | 'desc';
  q?: string;
}

export interface Page<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

function compareValues(a: Sortable, b: Sortable): number {
  // Nulls last in ascending order, like PostgreSQL's default.
  if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
  if (typeof a === 'string' && typeof b === 'string') return collator.compare(a, b);
  return Number(a) - Number(b);
}

/**
 * Filters by `q` (case-insensitive substring of `searchText`), sorts by the query's column with the
 * id as tie-breaker (so pages never overlap), and cuts the requested page.
 */
export function pageRows<T extends { id: string }, K extends string>(
  rows: readonly T[],
  query: PageQuery<K>,
  sortValue: (row: T, key: K) => Sortable,
  searchText: (row: T) => string,
): Page<T> {
  const needle = query.q?.toLowerCase();
  const matched = needle ? rows.filter((r) => searchText(r).toLowerCase().includes(needle)) : [...rows];
  const sign = query.order === 'desc' ? -1 : 1;
  matched.sort((x, y) =>
    sign * compareValues(sortValue(x, query.sort), sortValue(y, query.sort)) || collator.compare(x.id, y.id));
  const start = (query.page - 1) * query.pageSize;
  return { items: matched.slice(start, start + query.pageSize), total: matched.length, page: query.page, pageSize: query.pageSize };
}
