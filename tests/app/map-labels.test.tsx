// Label choice: big kinds first, no overlapping names, the selected site always named.
import { pickLabels } from '@/components/map/map-labels';
import type { PlacedSite } from '@/components/map/map-geometry';

const site = (id: string, kind: PlacedSite['kind'], x: number, y: number): PlacedSite =>
  ({ id, name: `Site ${id}`, kind, lat: 0, lon: 0, cpuUtilisation: 0, x, y });
const size = { widthPx: 500, heightPx: 400 };
const r = () => 5;

test('only the first kinds are named, biggest first', () => {
  const sites = [site('c', 'core', 50, 50), site('a', 'aggregation', 50, 150), site('e', 'edge', 50, 250)];
  expect([...pickLabels(sites, 1, r, size)]).toEqual(['c']);
  expect(pickLabels(sites, 2, r, size)).toEqual(new Set(['c', 'a']));
  expect(pickLabels(sites, 0, r, size).size).toBe(0);
});

test('a label that would overlap a bigger site\'s label is left out; a pinned site always wins its place', () => {
  const sites = [site('agg', 'aggregation', 100, 104), site('core', 'core', 100, 100)];
  expect([...pickLabels(sites, 2, r, size)]).toEqual(['core']);
  expect([...pickLabels(sites, 2, r, size, (s) => (s.id === 'agg' ? 0 : null))]).toEqual(['agg']);
  // A pinned (selected or highlighted) site is named even when its kind would not be at this zoom, even with none.
  expect(pickLabels([site('cell', 'cell-site', 10, 10)], 0, r, size, () => 1).has('cell')).toBe(true);
  // Among pinned sites the lower pin goes first.
  const pair = [site('x', 'cell-site', 100, 100), site('y', 'cell-site', 100, 102)];
  expect([...pickLabels(pair, 0, r, size, (s) => (s.id === 'y' ? 0 : 1))]).toEqual(['y']);
});

test('labels off screen are not placed', () => {
  expect(pickLabels([site('c', 'core', -300, 50)], 4, r, size).size).toBe(0);
});

test("a name that would cover another named site's glyph is left out", () => {
  // 'b' sits where the label of 'a' would run (to the right of 'a').
  const sites = [site('a', 'core', 100, 100), site('b', 'core', 130, 100)];
  expect([...pickLabels(sites, 1, r, size)]).toEqual(['b']);
});
