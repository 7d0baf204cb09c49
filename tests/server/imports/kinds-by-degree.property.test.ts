// Property: kinds by degree give the most connected ceil(10 %) of sites core and the next ceil(30 %) aggregation,
// never rank a less connected site above a more connected one, and break ties by id (numbers as numbers).
import fc from 'fast-check';
import { kindsByDegree } from '../../../server/imports/graphml-fill';

const RANK = { core: 0, aggregation: 1, edge: 2, 'cell-site': 3 } as const;

const graph = fc.integer({ min: 1, max: 40 }).chain((n) => fc.record({
  ids: fc.shuffledSubarray([...Array(n).keys()].map(String), { minLength: n, maxLength: n }),
  ends: fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1)), { maxLength: 3 * n }),
}));

test('kinds by degree: shares of 10 % core and 30 % aggregation, ordered by degree, ties by numeric id', () => {
  fc.assert(fc.property(graph, ({ ids, ends }) => {
    const spans = ends.map(([a, b]) => ({ a: String(a), b: String(b) }));
    const kinds = kindsByDegree(ids, spans);
    const degree = (id: string) => spans.filter((s) => s.a === id || s.b === id).length;
    const count = (k: string) => ids.filter((id) => kinds.get(id) === k).length;
    const n = ids.length;
    expect(count('core')).toBe(Math.min(n, Math.ceil(n / 10 - 1e-9)));
    expect(count('aggregation')).toBe(Math.min(n - count('core'), Math.ceil((3 * n) / 10 - 1e-9)));
    expect(count('core') + count('aggregation') + count('edge')).toBe(n);
    for (const x of ids) {
      for (const y of ids) {
        const [kx, ky] = [RANK[kinds.get(x)!], RANK[kinds.get(y)!]];
        if (kx < ky) expect(degree(x) > degree(y) || (degree(x) === degree(y) && Number(x) < Number(y))).toBe(true);
      }
    }
  }), { seed: 20240612, numRuns: 200 });
});

test('ten sites in a ring with one spoke: the spoke\'s ends rank first, then the lowest ids', () => {
  const ids = [...Array(10).keys()].map(String);
  const spans = [...ids.map((id, i) => ({ a: id, b: String((i + 1) % 10) })), { a: '9', b: '4' }];
  const kinds = kindsByDegree(ids, spans);
  // 10 sites: 1 core, 3 aggregation. Degrees: 4 and 9 have 3, the rest 2; "4" < "9".
  expect(ids.filter((id) => kinds.get(id) === 'core')).toEqual(['4']);
  expect(ids.filter((id) => kinds.get(id) === 'aggregation')).toEqual(['0', '1', '9']);
});
