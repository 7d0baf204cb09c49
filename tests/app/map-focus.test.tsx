// Fit to the affected area: which sites make the area, and the zoom and pan that show it with a margin.
import fc from 'fast-check';
import { render, screen } from '@testing-library/react-native';
import { focusSiteIds, PORTRAIT_FILL_MAX_ZOOM, portraitFillView, viewForArea } from '@/components/map/map-focus';
import { PAGE_MAP_HEIGHT_PX, pageMapHeightPx } from '@/components/map/map-height';
import { applyView, MAX_ZOOM } from '@/components/map/map-view';
import { NetworkMap } from '@/components/map/network-map';
import { demoMapData } from './map-demo-data';

jest.setTimeout(30_000);

const line = {
  sites: ['a', 'b', 'c', 'd', 'e'].map((id) => ({ id })),
  // a – b – c – d – e, and a side branch b – x that is not in the data (a tenant's partial view).
  spans: [
    { id: 'ab', a: 'a', b: 'b' }, { id: 'bc', a: 'b', b: 'c' }, { id: 'cd', a: 'c', b: 'd' },
    { id: 'de', a: 'd', b: 'e' }, { id: 'bx', a: 'b', b: 'x' },
  ],
};
const asData = (d: typeof line) => ({
  sites: d.sites.map((s) => ({ ...s, name: s.id, kind: 'edge' as const, lat: 0, lon: 0, cpuUtilisation: 0 })),
  spans: d.spans.map((s) => ({ ...s, capacityGbps: 10, utilisation: 0 })),
});

describe('focusSiteIds', () => {
  test('a focus site brings its neighbours one span away, not further', () => {
    expect(new Set(focusSiteIds(asData(line), { sites: ['c'] }))).toEqual(new Set(['b', 'c', 'd']));
  });
  test('a focus span brings both ends and their neighbours; unknown ids are left out', () => {
    expect(new Set(focusSiteIds(asData(line), { spans: ['ab'], sites: ['zz'] }))).toEqual(new Set(['a', 'b', 'c']));
  });
  test('no focus gives no area', () => {
    expect(focusSiteIds(asData(line), {})).toEqual([]);
  });
});

describe('viewForArea', () => {
  const size = { widthPx: 400, heightPx: 300 };
  test('every point of the area lands inside the viewport with the margin kept, or the view is the whole network', () => {
    const point = fc.record({ x: fc.double({ min: 0, max: 400, noNaN: true }), y: fc.double({ min: 0, max: 300, noNaN: true }) });
    fc.assert(fc.property(fc.array(point, { minLength: 1, maxLength: 8 }), fc.integer({ min: 0, max: 60 }), (points, marginPx) => {
      const view = viewForArea(points, size, 20, marginPx);
      expect(view).not.toBeNull();
      if (view!.zoom === 1) {
        expect(view).toEqual({ zoom: 1, panX: 0, panY: 0 });
        return;
      }
      for (const p of points) {
        const s = applyView(view!, p);
        expect(s.x).toBeGreaterThanOrEqual(20 - 1e-6);
        expect(s.x).toBeLessThanOrEqual(380 + 1e-6);
        expect(s.y).toBeGreaterThanOrEqual(marginPx + 20 - 1e-6);
        expect(s.y).toBeLessThanOrEqual(280 + 1e-6);
      }
    }));
  });
  test('a small area is zoomed in and centred; the zoom never passes the map limit', () => {
    const view = viewForArea([{ x: 100, y: 100 }, { x: 140, y: 120 }], size, 20)!;
    expect(view.zoom).toBeGreaterThan(2);
    const centre = applyView(view, { x: 120, y: 110 });
    expect(centre.x).toBeCloseTo(200, 6);
    expect(centre.y).toBeCloseTo(150, 6);
    expect(viewForArea([{ x: 5, y: 5 }], size, 20)!.zoom).toBe(MAX_ZOOM);
  });
  test('an area as big as the map gives the whole-network view, and no points give none', () => {
    expect(viewForArea([{ x: 0, y: 0 }, { x: 400, y: 300 }], size, 20)).toEqual({ zoom: 1, panX: 0, panY: 0 });
    expect(viewForArea([], size, 20)).toBeNull();
  });
});

describe('a map with a focus', () => {
  const data = demoMapData();
  const span = data.spans[0];
  test('opens zoomed in (the whole-network button is live) and names the focus sites', () => {
    render(<NetworkMap data={data} highlight={{ spans: [span.id], sites: [span.a, span.b], tone: 'window' }} focus={{ spans: [span.id] }} heightPx={320} />);
    expect(screen.getByTestId('map-reset')).toBeEnabled();
    expect(screen.getByTestId(`map-label-${span.a}`)).toBeTruthy();
    expect(screen.getByTestId(`map-label-${span.b}`)).toBeTruthy();
  });
  test('without a focus the same map opens on the whole network', () => {
    render(<NetworkMap data={data} highlight={{ spans: [span.id], tone: 'window' }} heightPx={320} />);
    expect(screen.getByTestId('map-reset')).toBeDisabled();
    expect(screen.queryByTestId(`map-label-${span.a}`)).toBeNull();
  });
});

describe('tap targets', () => {
  test('every site, however small its glyph, carries an invisible tap circle at least 44 px across', () => {
    const data = demoMapData();
    render(<NetworkMap data={data} heightPx={320} />);
    for (const site of data.sites) {
      const group = screen.getByTestId(`map-site-${site.id}`);
      const radii = group.findAll((n) => n.props.r !== undefined && n.props.fill === 'transparent').map((n) => Number(n.props.r));
      expect(Math.max(0, ...radii) * 2).toBeGreaterThanOrEqual(44);
    }
  });
});

describe('pageMapHeightPx', () => {
  test('a phone gets half its height or more, a wide screen stays within the cap, a tiny window the minimum', () => {
    expect(pageMapHeightPx(358, 844)).toBeGreaterThanOrEqual(422);
    expect(pageMapHeightPx(358, 844)).toBeLessThanOrEqual(844 * 0.6);
    expect(pageMapHeightPx(1000, 1200)).toBe(PAGE_MAP_HEIGHT_PX.max);
    expect(pageMapHeightPx(200, 300)).toBe(PAGE_MAP_HEIGHT_PX.min);
  });
});

describe('portraitFillView (the phone map screen held upright)', () => {
  // A network twice as wide as it is tall, fitted to the width of a 370 × 600 px map (zoom 1 is the whole network).
  const wideNetwork = [{ x: 10, y: 220 }, { x: 360, y: 220 }, { x: 185, y: 395 }, { x: 10, y: 395 }];
  const phone = { widthPx: 370, heightPx: 600 };

  test('enlarges the network towards the height, at most PORTRAIT_FILL_MAX_ZOOM, centred on it', () => {
    const view = portraitFillView(wideNetwork, phone, 16)!;
    expect(view.zoom).toBe(PORTRAIT_FILL_MAX_ZOOM);
    const top = applyView(view, { x: 185, y: 220 });
    const bottom = applyView(view, { x: 185, y: 395 });
    // The network's height grows from 175 px to 1.7 × 175 ≈ 298 px, centred in the 600 px height.
    expect(bottom.y - top.y).toBeCloseTo(175 * PORTRAIT_FILL_MAX_ZOOM, 6);
    expect((top.y + bottom.y) / 2).toBeCloseTo(300, 6);
    expect(applyView(view, { x: 185, y: 300 }).x).toBeCloseTo(185, 6);
  });

  test('a taller network just fills the height; one that already does, a landscape screen or one site change nothing', () => {
    const taller = [{ x: 0, y: 100 }, { x: 370, y: 450 }];
    expect(portraitFillView(taller, phone, 16)!.zoom).toBeCloseTo((600 - 32) / 350, 6);
    const fullHeight = [{ x: 100, y: 10 }, { x: 200, y: 590 }];
    expect(portraitFillView(fullHeight, phone, 16)).toBeNull();
    expect(portraitFillView(wideNetwork, { widthPx: 800, heightPx: 600 }, 16)).toBeNull();
    expect(portraitFillView([{ x: 5, y: 5 }], phone, 16)).toBeNull();
  });
});
