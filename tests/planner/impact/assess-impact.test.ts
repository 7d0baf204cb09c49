import fc from 'fast-check';
import { buildInventory, compileWindow } from '../../../planner/model/build-inventory';
import { assessImpact } from '../../../planner/impact/assess-impact';
import { buildElementIndex } from '../../../planner/impact/element-index';
import { fullScanAffected } from '../../../planner/impact/full-scan';
import { type SliceSpec, TINY_SLICES, TINY_WINDOWS, scenarioWith, tinyScenario, window } from '../fixtures/tiny-scenario';
import { randomScenario } from '../fixtures/random-scenario';

const inv = buildInventory(tinyScenario());
const w = (id: string) => compileWindow(TINY_WINDOWS.find((x) => x.id === id)!);
const reasons = (report: ReturnType<typeof assessImpact>) =>
  Object.fromEntries(report.affected.map((a) => [a.slice, a.reasons]));

describe('assessImpact on the tiny scenario', () => {
  it('finds nothing for a window that touches nothing', () => {
    expect(assessImpact(inv, w('w-nothing'))).toEqual({
      affected: [], needsReplacement: [], splits: false, components: 1, overloaded: [],
    });
  });

  it('site B down: hosted and transit slices need replacement; the C–D slice loses its alternative route', () => {
    const report = assessImpact(inv, w('w-site-b'));
    expect(reasons(report)).toEqual({
      's-hosted': ['hosted', 'transit'], 's-transit': ['transit'], 's-quiet': ['unprotected'],
    });
    expect(report.needsReplacement).toEqual([0, 1]);
    expect(report.splits).toBe(false);
    expect(report.affected.map((a) => a.severity)).toEqual(['medium', 'critical', 'low']);
  });

  it('a reduced span whose load no longer fits squeezes the slices on it', () => {
    // bd at 20 % of 20 Gbit/s = 4 < 5 Gbit/s of s-transit
    const report = assessImpact(inv, w('w-reduce-bd'));
    expect(reasons(report)).toEqual({ 's-transit': ['squeezed'] });
    expect(report.overloaded).toEqual([{ span: 'bd', loadGbps: 5, capacityGbps: 4 }]);
  });

  it('site D down isolates E: the network splits into two components', () => {
    const report = assessImpact(inv, w('w-site-d'));
    expect(report.splits).toBe(true);
    expect(report.components).toBe(2);
    // With D gone, A–B and A–C become bridges, so s-hosted (on ab) loses its alternative route.
    expect(reasons(report)).toEqual({
      's-hosted': ['unprotected'], 's-transit': ['transit'], 's-quiet': ['hosted', 'transit'],
    });
  });

  it('reports spans overloaded when cut ties take the plain shortest path', () => {
    const heavy: SliceSpec = { id: 's-heavy', functions: { x: ['A', 1], y: ['B', 1] }, ties: [['x-y', 'x', 'y', 30, 5, ['ab']]] };
    const big = buildInventory(scenarioWith([...TINY_SLICES, heavy]));
    const report = assessImpact(big, w('w-span-ab'));
    // Detour for A–B is A–C–D–B. bd: 5 − 5 (s-transit leaves) + 30 + 2; cd: 1 + 30 + 2 + 5 (s-transit via D–C–A).
    expect(report.overloaded).toEqual([
      { span: 'bd', loadGbps: 32, capacityGbps: 20 },
      { span: 'cd', loadGbps: 38, capacityGbps: 20 },
    ]);
  });

  it('counts reservations against reduced or reserved elements', () => {
    const report = assessImpact(inv, w('w-nothing'), { reservations: { spanGbps: { cd: 19.5 } } });
    expect(reasons(report)).toEqual({ 's-quiet': ['squeezed'] });
    expect(report.needsReplacement).toEqual([2]);
  });

  it('uses a given index and agrees with the full scan', () => {
    const index = buildElementIndex(inv);
    for (const spec of TINY_WINDOWS) {
      const win = compileWindow(spec);
      expect(assessImpact(inv, win, { index }).needsReplacement).toEqual(fullScanAffected(inv, win));
    }
    expect(fullScanAffected(inv, compileWindow(window('x', { spans: ['de'] })))).toEqual([1]);
  });
});

describe('assessImpact on random scenarios', () => {
  it('the reverse index finds exactly the slices the full scan finds', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 2 ** 31 - 1 }), (seed) => {
        const { scenario, window: spec } = randomScenario(seed);
        const random = buildInventory(scenario);
        const win = compileWindow(spec);
        expect(assessImpact(random, win).needsReplacement).toEqual(fullScanAffected(random, win));
      }),
      { numRuns: 150 },
    );
  });
});
