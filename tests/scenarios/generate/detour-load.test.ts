// The obvious-detour load behind the benchmark's scarcity figure, on the hand-built square (loads worked by hand).
import { detourLoad, detourPeakUtilisation } from '../../../scenarios/generate/detour-load';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { scenarioWith, window, type SliceSpec } from '../../planner/fixtures/tiny-scenario';

//   A ─ab 15 km─ B
//   │            │
//   ac 12       bd 11          capacities ab 40, ac 40, bd 20, cd 20, de 10 Gbit/s
//   │            │
//   C ─cd 16 km─ D ─de 8─ E
const slices = (fixedOnB: boolean): SliceSpec[] => [
  { id: 's1', functions: { a: ['A', 1], d: ['D', 1] }, ties: [['t1', 'a', 'd', 5, 1, ['ab', 'bd']]] },
  { id: 's2', functions: { c: ['C', 1], e: ['E', 1] }, ties: [['t2', 'c', 'e', 3, 1, ['cd', 'de']]] },
  { id: 's3', fixed: fixedOnB ? ['b'] : [], functions: { b: ['B', 1], a: ['A', 1] }, ties: [['t3', 'b', 'a', 2, 1, ['ab']]] },
];

function loads(fixedOnB: boolean, down: { sites?: string[]; spans?: string[] }) {
  const inv = buildInventory(scenarioWith(slices(fixedOnB)));
  const w = compileWindow(window('w', down));
  const d = detourLoad(inv, w);
  const byId = (xs: Float64Array) => Object.fromEntries(inv.network.spans.map((s) => [s.id, xs[s.index]]));
  return { now: byId(d.nowGbps), during: byId(d.windowGbps), d, peak: detourPeakUtilisation(inv, w), inv };
}

describe('detourLoad', () => {
  it('reroutes a cut tie on its shortest surviving path and leaves untouched slices alone', () => {
    const r = loads(false, { spans: ['bd'] });
    expect(r.now).toEqual({ ab: 7, ac: 0, bd: 5, cd: 3, de: 3 });
    // s1 goes A–C–D (28 km) instead of A–B–D (26 km).
    expect(r.during).toEqual({ ab: 2, ac: 5, bd: 0, cd: 8, de: 3 });
    expect(r.d.touched).toEqual([0]);
    expect(r.d.stranded).toEqual([]);
    expect(r.peak).toBeCloseTo(8 / 20, 12);
  });

  it('moves a function off a down site to the nearest up site and reroutes its ties from there', () => {
    // B (50.0, 10.2) is 11.1 km from D (49.9, 10.2) and 14.3 km from A (50.0, 10.0): s3's b moves to D.
    const r = loads(false, { sites: ['B'] });
    expect(r.during).toEqual({ ab: 0, ac: 7, bd: 0, cd: 10, de: 3 });
    expect(r.d.touched).toEqual([0, 2]);
    expect(r.peak).toBeCloseTo(10 / 20, 12);
  });

  it('counts a fixed function on a down site as stranded and drops its load', () => {
    const r = loads(true, { sites: ['B'] });
    expect(r.during).toEqual({ ab: 0, ac: 5, bd: 0, cd: 8, de: 3 });
    expect(r.d.stranded).toEqual([2]);
    expect(r.peak).toBeCloseTo(8 / 20, 12);
  });
});
