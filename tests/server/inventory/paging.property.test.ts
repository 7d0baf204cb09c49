// Paging on rows indexed once per revision answers what filtering, sorting and cutting the rows per request would.
import fc from 'fast-check';
import { indexRows, pageIndexed } from '../../../server/services/inventory/paging';

type Row = { id: string; name: string; load: number | null; kind: string };
type Key = 'id' | 'name' | 'load';

const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/** The per-request way: filter the rows, sort the matches (nulls last, then by id), cut the page. */
function naivePage(rows: Row[], q: { page: number; pageSize: number; sort: Key; order: 'asc' | 'desc'; q?: string }, kind?: string) {
  const value = (r: Row) => r[q.sort];
  const cmp = (a: string | number | null, b: string | number | null) => {
    if (a === null || b === null) return a === b ? 0 : a === null ? 1 : -1;
    return typeof a === 'string' && typeof b === 'string' ? collator.compare(a, b) : Number(a) - Number(b);
  };
  const sign = q.order === 'desc' ? -1 : 1;
  const matched = rows
    .filter((r) => (!q.q || `${r.id} ${r.name}`.toLowerCase().includes(q.q.toLowerCase())) && (!kind || r.kind === kind))
    .sort((x, y) => sign * cmp(value(x), value(y)) || collator.compare(x.id, y.id));
  const start = (q.page - 1) * q.pageSize;
  return { items: matched.slice(start, start + q.pageSize), total: matched.length, page: q.page, pageSize: q.pageSize };
}

const rowsArb = fc.uniqueArray(fc.nat(500), { maxLength: 80 }).chain((ids) => fc.tuple(...ids.map((n) => fc.record({
  id: fc.constant(`site-${n}`),
  name: fc.constantFrom('Alpha', 'alpha', 'Beta 2', 'Beta 10', 'Gamma', 'Ørsted', ''),
  load: fc.option(fc.integer({ min: -5, max: 5 }), { nil: null }),
  kind: fc.constantFrom('core', 'edge'),
}))));

test('an indexed page equals the filtered, sorted and cut rows, for any query and any of its repeats', () => {
  fc.assert(fc.property(
    rowsArb,
    fc.record({
      page: fc.integer({ min: 1, max: 4 }), pageSize: fc.integer({ min: 1, max: 30 }),
      sort: fc.constantFrom<Key>('id', 'name', 'load'), order: fc.constantFrom<'asc' | 'desc'>('asc', 'desc'),
      q: fc.option(fc.constantFrom('a', 'BETA', '1', 'site-1', 'ø'), { nil: undefined }),
    }),
    fc.option(fc.constantFrom('core', 'edge'), { nil: undefined }),
    (rows, query, kind) => {
      const table = indexRows(rows, (r) => `${r.id} ${r.name}`);
      const keep = kind ? (r: Row) => r.kind === kind : undefined;
      const expected = naivePage(rows, query, kind);
      expect(pageIndexed(table, query, (r, key: Key) => r[key], keep)).toEqual(expected);
      // The second request reuses the memoised order and must answer the same.
      expect(pageIndexed(table, query, (r, key: Key) => r[key], keep)).toEqual(expected);
    },
  ));
});
