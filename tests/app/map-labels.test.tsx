// Label choice: big kinds first, no overlapping names, the selected site always named.
import { pickLabels } from '@/components/map/map-labels';
import type { PlacedSite } from '@/components/map/map-geometry';

const site = (id: string, kind: PlacedSite['kind'], x: number, y: number): PlacedSite =>
  ({ id, name: `Site ${id}`, kind, lat: 0, lon: 0, cpuUtilisation: 0, x, y });
const size = { widthPx: 500, heightPx: 400 };
const r = () => 5;

test('only the first kinds are named, biggest first', () => {
  const sites = [site('c', 'core', 50, 50), site('a', 'aggregation', 50, 150), site('e', 'edge', 50, 250)];
  expect([...pickLabels(sites, 1, r, size).keys()]).toEqual(['c']);
  expect(new Set(pickLabels(sites, 2, r, size).keys())).toEqual(new Set(['c', 'a']));
  expect(pickLabels(sites, 0, r, size).size).toBe(0);
});

test('a name goes left when right is taken, then above or below, and is left out when every side is; pinned sites go first', () => {
  // 'agg' sits 4 px under 'core': their names cannot both go right.
  const core = site('core', 'core', 100, 100);
  const agg = site('agg', 'aggregation', 100, 104);
  expect([...pickLabels([agg, core], 2, r, size)]).toEqual([['core', 'right'], ['agg', 'left']]);
  // A cell site left of them blocks the left side too (its glyph may not be covered): 'agg' goes below.
  const cell = site('cell', 'cell-site', 70, 104);
  expect([...pickLabels([agg, core, cell], 2, r, size)]).toEqual([['core', 'right'], ['agg', 'below']]);
  // With cell sites above and below as well, 'agg' has no side left.
  const north = site('n', 'cell-site', 100, 84);
  const south = site('s', 'cell-site', 100, 122);
  expect([...pickLabels([agg, core, cell, north, south], 2, r, size)]).toEqual([['core', 'right']]);
  // Pin 0 (the selected site) is named even with both sides blocked.
  const crowded = [
    site('sel', 'edge', 100, 100), site('e', 'edge', 125, 100), site('w', 'edge', 75, 100),
    site('n', 'edge', 100, 80), site('s', 'edge', 100, 120),
  ];
  expect(pickLabels(crowded, 0, r, size, (s) => (s.id === 'sel' ? 1 : null)).has('sel')).toBe(false);
  expect(pickLabels(crowded, 0, r, size, (s) => (s.id === 'sel' ? 0 : null)).get('sel')).toBe('right');
  // Pinning 'agg' gives it the right side first; then 'core' has no side left.
  expect([...pickLabels([agg, core, cell, north, south], 2, r, size, (s) => (s.id === 'agg' ? 0 : null))]).toEqual([['agg', 'right']]);
  // A pinned (selected or highlighted) site is named even when its kind would not be at this zoom.
  expect(pickLabels([site('c', 'cell-site', 10, 10)], 0, r, size, () => 1).has('c')).toBe(true);
  // Among pinned sites the lower pin goes first and takes the right side.
  const pair = [site('x', 'cell-site', 100, 100), site('y', 'cell-site', 100, 102)];
  expect([...pickLabels(pair, 0, r, size, (s) => (s.id === 'y' ? 0 : 1))]).toEqual([['y', 'right'], ['x', 'left']]);
});

test('labels off screen are not placed', () => {
  expect(pickLabels([site('c', 'core', -300, 50)], 4, r, size).size).toBe(0);
});

test("a name that would cover another named site's glyph is left out", () => {
  // 'b' sits where the name of 'a' would run on the right, 'c' on the left, 'n' above and 's' below.
  const sites = [
    site('a', 'core', 100, 100), site('b', 'aggregation', 130, 100), site('c', 'cell-site', 70, 100),
    site('n', 'cell-site', 100, 80), site('s', 'cell-site', 100, 120),
  ];
  expect(pickLabels(sites, 1, r, size).has('a')).toBe(false);
  // Without 'n', the name goes above.
  expect(pickLabels(sites.filter((x) => x.id !== 'n'), 1, r, size).get('a')).toBe('above');
});
