// The map in words: every site and span the map draws, grouped by kind, each a button that selects it and reads
// its load as text; the drawing itself is one named image without labelled groups.
import { fireEvent, render, screen, within } from '@testing-library/react-native';
import { useState } from 'react';
import { Text } from 'react-native';
import { mapElementGroups, siteDetail, spanDetail, spanName } from '@/components/map/map-element-labels';
import { MapElementList } from '@/components/map/map-element-list';
import type { MapSelection, NetworkMapData } from '@/components/map/map-types';
import { demoMapData } from './map-demo-data';

const small: NetworkMapData = {
  name: 'Test net', outline: null,
  sites: [
    { id: 's-orr', name: 'Orrindale', kind: 'core', lat: 0, lon: 0, cpuUtilisation: 0.4 },
    { id: 's-bex', name: 'Bexley', kind: 'aggregation', lat: 0, lon: 1, cpuUtilisation: null },
    { id: 's-ash', name: 'Ashcombe', kind: 'core', lat: 1, lon: 0, cpuUtilisation: 0.904 },
    { id: 's-c1', name: 'Cove mast', kind: 'cell-site', lat: 1, lon: 1, cpuUtilisation: 0 },
  ],
  spans: [
    { id: 'sp-1', a: 's-orr', b: 's-bex', capacityGbps: 100, utilisation: 0.62 },
    { id: 'sp-2', a: 's-ash', b: 's-orr', capacityGbps: 40, utilisation: null },
  ],
};

test('load reads as text: "Orrindale, core site, CPU 40 % used", spans by their sites\' names', () => {
  expect(`Orrindale, ${siteDetail(small.sites[0])}`).toBe('Orrindale, core site, CPU 40 % used');
  expect(siteDetail(small.sites[1])).toBe('aggregation site, no CPU figure');
  expect(siteDetail(small.sites[3])).toBe('cell site, CPU 0 % used');
  const names = new Map(small.sites.map((s) => [s.id, s.name]));
  expect(`${spanName(small.spans[0], names)}, ${spanDetail(small.spans[0])}`).toBe('Orrindale — Bexley, span, 100 Gbit/s, 62 % used');
  expect(spanDetail(small.spans[1])).toBe('span, 40 Gbit/s, no load figure');
});

test('the groups hold exactly the sites and spans of the map, biggest kind first, by name', () => {
  const demo = demoMapData();
  const groups = mapElementGroups(demo);
  const siteIds = groups.flatMap((g) => (g.kind === 'sites' ? g.sites.map((s) => s.id) : []));
  const spanIds = groups.flatMap((g) => (g.kind === 'spans' ? g.spans.map((s) => s.id) : []));
  expect([...siteIds].sort()).toEqual(demo.sites.map((s) => s.id).sort());
  expect([...spanIds].sort()).toEqual(demo.spans.map((s) => s.id).sort());
  expect(mapElementGroups(small).map((g) => g.title)).toEqual(['Core sites', 'Aggregation sites', 'Cell sites', 'Spans']);
  const core = mapElementGroups(small)[0];
  expect(core.kind === 'sites' && core.sites.map((s) => s.name)).toEqual(['Ashcombe', 'Orrindale']);
});

function Harness({ initiallyOpen = true }: { initiallyOpen?: boolean }) {
  const [selected, setSelected] = useState<MapSelection | null>(null);
  return (
    <>
      <MapElementList data={small} selected={selected} onSelect={setSelected} initiallyOpen={initiallyOpen} />
      <MapSelectedProbe selected={selected} />
    </>
  );
}

function MapSelectedProbe({ selected }: { selected: MapSelection | null }) {
  return selected ? <Text>{`selected ${selected.kind} ${selected.id}`}</Text> : null;
}

test('each entry is a button named by its text that selects its site or span and shows as pressed', () => {
  render(<Harness />);
  const list = screen.getByTestId('map-list');
  expect(within(list).getByRole('heading', { name: 'Sites and spans on the map' })).toBeTruthy();
  const orrindale = screen.getByTestId('map-list-site-s-orr');
  expect(orrindale).toHaveAccessibleName('Orrindale, core site, CPU 40 % used');
  const pressed = (testID: string) => screen.getByTestId(testID).props['aria-pressed'];
  expect(pressed('map-list-site-s-orr')).toBe(false);
  fireEvent.press(orrindale);
  expect(screen.getByText('selected site s-orr')).toBeTruthy();
  expect(pressed('map-list-site-s-orr')).toBe(true);
  fireEvent.press(screen.getByTestId('map-list-span-sp-1'));
  expect(screen.getByText('selected span sp-1')).toBeTruthy();
  expect(pressed('map-list-site-s-orr')).toBe(false);
  expect(pressed('map-list-span-sp-1')).toBe(true);
  expect(screen.getByTestId('map-list-span-sp-1')).toHaveAccessibleName('Orrindale — Bexley, span, 100 Gbit/s, 62 % used');
});

test('on phones the list starts folded behind a toggle that says how many entries it holds', () => {
  render(<Harness initiallyOpen={false} />);
  expect(screen.queryByTestId('map-list-site-s-orr')).toBeNull();
  const toggle = screen.getByTestId('map-list-toggle');
  expect(toggle).toHaveTextContent('Show the list (6)');
  fireEvent.press(toggle);
  expect(screen.getByTestId('map-list-site-s-orr')).toBeTruthy();
  expect(screen.getByTestId('map-list-toggle')).toHaveTextContent('Hide the list');
});
