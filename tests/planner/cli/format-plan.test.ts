// The command line's output for a plan with a knock-on move: the JSON names it (madeRoomFor on the entry, the
// knockOn list, the search's own figures) and the table marks it.
import { toJsonDocument, toTable } from '../../../planner/cli/format-plan';
import { knockOnResult } from '../steps/knock-on-fixture';

const own = { unresolvedWeight: 5, unresolved: 1, moved: 2, rerouted: 0, moveCost: 6.5, usage: 120, peakUtilisation: 0.9 };

describe('format-plan with knock-on moves', () => {
  it('JSON: the knock-on entry carries madeRoomFor, the document lists it under knockOn, search when present', () => {
    const doc = toJsonDocument(knockOnResult({ objective: own, feasible: true, usedFallback: 'greedy' })) as Record<string, unknown>;
    expect(doc.affected).toEqual(['T']);
    expect(doc.knockOn).toEqual(['K']);
    expect(doc.slices).toEqual([
      { slice: 'T', outcome: 'reroute', sites: { t1: 'A', t2: 'B' }, paths: { t: ['ac', 'cd', 'bd'] } },
      { slice: 'K', outcome: 'reroute', sites: { k1: 'C', k2: 'D' }, paths: { k: ['cd2'] }, madeRoomFor: ['T'] },
    ]);
    expect(doc.search).toEqual({ objective: own, feasible: true, usedFallback: 'greedy' });
  });

  it('JSON without knock-on moves or a search record: an empty knockOn list and no search key', () => {
    const plain = knockOnResult();
    const doc = toJsonDocument({ ...plain, slices: plain.slices.filter((s) => s.slice === 'T') }) as Record<string, unknown>;
    expect(doc.knockOn).toEqual([]);
    expect(doc).not.toHaveProperty('search');
  });

  it('table: counts and marks the knock-on row with what it makes room for, and notes the fallback', () => {
    const text = toTable(knockOnResult({ objective: own, feasible: false, usedFallback: 'greedy' }));
    expect(text).toMatch(/knock-on moves 1: slices the window does not touch, moved to make room/);
    expect(text).toMatch(/search alone: infeasible · unresolved 1 · move cost 6\.5; kept the greedy plan instead/);
    const row = text.split('\n').find((l) => l.startsWith('K *'))!;
    expect(row).toMatch(/reroute .* makes room for T$/);
    expect(text.split('\n').find((l) => l.startsWith('T '))).not.toMatch(/makes room/);
  });
});
