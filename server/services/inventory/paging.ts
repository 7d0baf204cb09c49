// In-memory search, sort and paging for inventory lists: rows built once per inventory revision, sort orders
// kept per (column, direction), so a request only walks one sorted index and cuts its page.
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

/** A list's rows of one revision, with their lower-cased search text and the sort orders asked for so far. */
export interface IndexedRows<T> {
  rows: readonly T[];
  search: readonly string[];
  orders: Map<string, Uint32Array>;
}

export function indexRows<T>(rows: readonly T[], searchText: (row: T) => string): IndexedRows<T> {
  return { rows, search: rows.map((r) => searchText(r).toLowerCase()), orders: new Map() };
}

function sortedOrder<T extends { id: string }, K extends string>(
  table: IndexedRows<T>, sort: K, order: 'asc' | 'desc', sortValue: (row: T, key: K) => Sortable,
): Uint32Array {
  const key = `${sort}:${order}`;
  let indices = table.orders.get(key);
  if (!indices) {
    const values = table.rows.map((r) => sortValue(r, sort));
    const sign = order === 'desc' ? -1 : 1;
    indices = Uint32Array.from(table.rows.keys()).sort((x, y) =>
      sign * compareValues(values[x], values[y]) || collator.compare(table.rows[x].id, table.rows[y].id));
    table.orders.set(key, indices);
  }
  return indices;
}

/**
 * Filters by `q` (case-insensitive substring of the search text) and `keep` (the list's own filters: kind,
 * tenant, …), in the order of the query's column with the id as tie-breaker (so pages never overlap), and cuts
 * the requested page. The order is total, so sorting once before filtering gives what sorting the matches would.
 */
export function pageIndexed<T extends { id: string }, K extends string>(
  table: IndexedRows<T>,
  query: PageQuery<K>,
  sortValue: (row: T, key: K) => Sortable,
  keep: (row: T) => boolean = () => true,
): Page<T> {
  const needle = query.q?.toLowerCase();
  const start = (query.page - 1) * query.pageSize;
  const items: T[] = [];
  let total = 0;
  for (const i of sortedOrder(table, query.sort, query.order, sortValue)) {
    const row = table.rows[i];
    if ((needle && !table.search[i].includes(needle)) || !keep(row)) continue;
    if (total >= start && items.length < query.pageSize) items.push(row);
    total += 1;
  }
  return { items, total, page: query.page, pageSize: query.pageSize };
}
