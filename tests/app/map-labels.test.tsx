// Label choice: big kinds first, no overlapping names, the selected site always named.
import { pickLabels } from '@/components/map/map-labels';
import type { PlacedSite } from '@/components/map/map-geometry';

const site = (id: string, kind: PlacedSite['kind'], x: number, y: number): PlacedSite =>
  ({ id, name: `Site ${id}`, kind, lat: 0, lon: 0, cpuUtilisation: 0, x, y });
const size = { widthPx: 500, heightPx: 400 };
const r = () => 5;

test('only the first kinds are named, biggest first', () => {
  const sites = [site('c', 'core', 50, 50), site('a', 'aggregation', 50, 150), site('e', 'edge', 50, 250)];
  expect([...pickLabels(sites, 1, r, size, null)]).toEqual(['c']);
  expect(pickLabels(sites, 2, r, size, null)).toEqual(new Set(['c', 'a']));
  expect(pickLabels(sites, 0, r, size, null).size).toBe(0);
});

test('a label that would overlap a bigger site\'s label is left out; the selected site always wins its place', () => {
  const sites = [site('agg', 'aggregation', 100, 104), site('core', 'core', 100, 100)];
  expect([...pickLabels(sites, 2, r, size, null)]).toEqual(['core']);
  expect([...pickLabels(sites, 2, r, size, 'agg')]).toEqual(['agg']);
  // The selected site is named even when its kind would not be at this zoom.
  expect(pickLabels([site('cell', 'cell-site', 10, 10)], 1, r, size, 'cell').has('cell')).toBe(true);
});

test('labels off screen are not placed', () => {
  expect(pickLabels([site('c', 'core', -300, 50)], 4, r, size, null).size).toBe(0);
});
