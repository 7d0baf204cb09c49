// Projection and view maths of the map: fit, aspect, orientation and zoom about a point.
import fc from 'fast-check';
import { boundsOf, fitProjection } from '@/components/map/projection';
import { applyView, HOME_VIEW, MAX_ZOOM, panBy, zoomAround } from '@/components/map/map-view';

const viewport = { widthPx: 400, heightPx: 300, paddingPx: 20 };

test('north is up and east is right', () => {
  const p = fitProjection([{ lon: 10, lat: 50 }, { lon: 11, lat: 51 }], viewport);
  const sw = p.project({ lon: 10, lat: 50 });
  const ne = p.project({ lon: 11, lat: 51 });
  expect(ne.x).toBeGreaterThan(sw.x);
  expect(ne.y).toBeLessThan(sw.y);
});

test('longitudes shrink by cos(mid latitude): at 60° a degree east is half a degree north on screen', () => {
  // cos 60° = 0.5 exactly (trigonometry, not a figure of the demo).
  const p = fitProjection([{ lon: 0, lat: 59 }, { lon: 4, lat: 61 }], viewport);
  const o = p.project({ lon: 2, lat: 60 });
  const east = p.project({ lon: 3, lat: 60 });
  const north = p.project({ lon: 2, lat: 61 });
  expect(p.lonScale).toBeCloseTo(0.5, 12);
  expect(east.x - o.x).toBeCloseTo((o.y - north.y) * 0.5, 9);
});

test('at the equator the projection is plain lon/lat with equal scales', () => {
  const p = fitProjection([{ lon: -1, lat: -1 }, { lon: 1, lat: 1 }], { widthPx: 200, heightPx: 200 });
  expect(p.lonScale).toBeCloseTo(1, 12);
  expect(p.project({ lon: -1, lat: 1 })).toEqual({ x: 0, y: 0 });
  expect(p.project({ lon: 1, lat: -1 })).toEqual({ x: 200, y: 200 });
});

test('the fitted box touches the padding on the limiting side and is centred on the other', () => {
  // 4° wide at lat 0, 1° tall: width limits; the shape is 4:1 in a 360×260 inner box.
  const p = fitProjection([{ lon: 0, lat: 0 }, { lon: 4, lat: 1 }], viewport);
  const a = p.project({ lon: 0, lat: 1 });
  const b = p.project({ lon: 4, lat: 0 });
  expect(a.x).toBeCloseTo(20, 1);
  expect(b.x).toBeCloseTo(380, 1);
  expect((a.y + b.y) / 2).toBeCloseTo(150, 6);
});

test('property: every fitted point lands inside the padded viewport', () => {
  const point = fc.record({ lon: fc.double({ min: -179, max: 179, noNaN: true }), lat: fc.double({ min: -80, max: 80, noNaN: true }) });
  fc.assert(
    fc.property(fc.array(point, { minLength: 1, maxLength: 30 }), fc.integer({ min: 50, max: 2000 }), fc.integer({ min: 50, max: 2000 }), (points, w, h) => {
      const p = fitProjection(points, { widthPx: w, heightPx: h, paddingPx: 10 });
      return points.every((pt) => {
        const { x, y } = p.project(pt);
        return x >= 10 - 1e-6 && x <= w - 10 + 1e-6 && y >= 10 - 1e-6 && y <= h - 10 + 1e-6;
      });
    }),
  );
});

test('no points, or non-finite ones only, put everything at the centre; one point sits at the centre', () => {
  expect(boundsOf([{ lon: NaN, lat: 1 }])).toBeNull();
  expect(fitProjection([], viewport).project({ lon: 5, lat: 5 })).toEqual({ x: 200, y: 150 });
  const one = fitProjection([{ lon: 7, lat: 45 }], viewport);
  const c = one.project({ lon: 7, lat: 45 });
  expect(c.x).toBeCloseTo(200, 9);
  expect(c.y).toBeCloseTo(150, 9);
});

test('zooming keeps the point under the focus still, and zooming back out returns home', () => {
  const focus = { x: 120, y: 80 };
  const zoomed = zoomAround(HOME_VIEW, 2.5, focus);
  expect(zoomed.zoom).toBe(2.5);
  // Under the home view the map point at `focus` is `focus` itself; it must still show at `focus`.
  const shown = applyView(zoomed, focus);
  expect(shown.x).toBeCloseTo(focus.x, 9);
  expect(shown.y).toBeCloseTo(focus.y, 9);
  const twice = zoomAround(zoomed, 1.3, { x: 300, y: 10 });
  const m = { x: (300 - zoomed.panX) / zoomed.zoom, y: (10 - zoomed.panY) / zoomed.zoom };
  expect(applyView(twice, m).x).toBeCloseTo(300, 9);
  expect(applyView(twice, m).y).toBeCloseTo(10, 9);
  expect(zoomAround(zoomed, 1 / 2.5, focus)).toEqual(HOME_VIEW);
  expect(zoomAround(HOME_VIEW, 1000, focus).zoom).toBe(MAX_ZOOM);
});

test('panning cannot drag the map out of sight', () => {
  const size = { widthPx: 400, heightPx: 300 };
  const far = panBy({ zoom: 2, panX: 0, panY: 0 }, 5000, -5000, size, 48);
  expect(far.panX).toBe(400 - 48);
  expect(far.panY).toBe(48 - 300 * 2);
  expect(panBy({ zoom: 2, panX: 0, panY: 0 }, 30, -20, size)).toEqual({ zoom: 2, panX: 30, panY: -20 });
});
