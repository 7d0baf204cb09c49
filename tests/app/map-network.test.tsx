// Component test of the network map on the invented demo data: every element drawn, legend, selection, highlight, zoom.
import { fireEvent, render, screen } from '@testing-library/react-native';
import { NetworkMap } from '@/components/map/network-map';
import { MAP_DIMMED_OPACITY } from '@/constants/theme';
import { demoMapData } from './map-demo-data';

// Drawing 120+ svg elements under the native test renderer is slow on a shared machine.
jest.setTimeout(30_000);

const data = demoMapData();

function opacityOf(testID: string): number {
  const value = screen.getByTestId(testID).props.opacity;
  return value === undefined ? 1 : Number(value);
}

test('draws every site and span of the demo, the outline and the legend', () => {
  render(<NetworkMap data={data} />);
  expect(data.sites.length).toBeGreaterThan(30);
  for (const site of data.sites) expect(screen.getByTestId(`map-site-${site.id}`)).toBeTruthy();
  for (const span of data.spans) expect(screen.getByTestId(`map-span-${span.id}`)).toBeTruthy();
  expect(screen.getByTestId('map-outline')).toBeTruthy();
  expect(screen.getByTestId('map-legend')).toBeTruthy();
  expect(screen.getByText('over capacity')).toBeTruthy();
  expect(screen.getByText('Cell site')).toBeTruthy();
});

test('pressing a site or a span calls onSelect with its kind and id', () => {
  const onSelect = jest.fn();
  render(<NetworkMap data={data} onSelect={onSelect} />);
  const site = data.sites[3];
  fireEvent.press(screen.getByTestId(`map-site-${site.id}`));
  expect(onSelect).toHaveBeenLastCalledWith({ kind: 'site', id: site.id });
  fireEvent.press(screen.getByTestId(`map-span-${data.spans[0].id}`));
  expect(onSelect).toHaveBeenLastCalledWith({ kind: 'span', id: data.spans[0].id });
  expect(onSelect).toHaveBeenCalledTimes(2);
});

test('a highlight draws its sites and spans at full strength and dims everything else', () => {
  const sites = [data.spans[0].a, data.spans[0].b];
  render(<NetworkMap data={data} highlight={{ sites, spans: [data.spans[0].id] }} />);
  expect(opacityOf(`map-site-${sites[0]}`)).toBe(1);
  expect(opacityOf(`map-span-${data.spans[0].id}`)).toBe(1);
  const others = data.sites.filter((s) => !sites.includes(s.id));
  for (const site of others) expect(opacityOf(`map-site-${site.id}`)).toBeCloseTo(MAP_DIMMED_OPACITY, 6);
  expect(opacityOf(`map-span-${data.spans[1].id}`)).toBeCloseTo(MAP_DIMMED_OPACITY, 6);
  expect(screen.getByText('Placement')).toBeTruthy();
});

test('a secondary highlight in the window tone shows beside the primary, and its tone joins the legend', () => {
  render(<NetworkMap data={data} highlight={{ spans: [data.spans[0].id] }} secondaryHighlight={{ spans: [data.spans[1].id], tone: 'window' }} />);
  expect(opacityOf(`map-span-${data.spans[1].id}`)).toBe(1);
  expect(opacityOf(`map-span-${data.spans[2].id}`)).toBeCloseTo(MAP_DIMMED_OPACITY, 6);
  expect(screen.getByText('In the window')).toBeTruthy();
});

test('without a highlight nothing is dimmed', () => {
  render(<NetworkMap data={data} />);
  for (const site of data.sites) expect(opacityOf(`map-site-${site.id}`)).toBe(1);
});

test('zoom buttons: zooming in enables zoom-out and reset, and reset returns to the whole network', () => {
  render(<NetworkMap data={data} />);
  expect(screen.getByTestId('map-zoom-out')).toBeDisabled();
  const before = screen.getByTestId('map-outline').props.d;
  fireEvent.press(screen.getByTestId('map-zoom-in'));
  expect(screen.getByTestId('map-zoom-out')).toBeEnabled();
  expect(screen.getByTestId('map-outline').props.d).not.toEqual(before);
  fireEvent.press(screen.getByTestId('map-reset'));
  expect(screen.getByTestId('map-outline').props.d).toEqual(before);
  expect(screen.getByTestId('map-reset')).toBeDisabled();
});

test('a tenant view without some end sites leaves their spans out instead of drawing to nowhere', () => {
  const partial = { ...data, sites: data.sites.filter((s) => s.id !== data.spans[0].a) };
  render(<NetworkMap data={partial} />);
  expect(screen.queryByTestId(`map-span-${data.spans[0].id}`)).toBeNull();
  expect(screen.getByTestId(`map-site-${data.spans[0].b}`)).toBeTruthy();
});
