// Turns map data into screen geometry for one viewport and view: the outline as a path, sites as points, spans as lines.
import { fitProjection, type LonLat, type Point, type Projection } from '@/components/map/projection';
import { applyView, type MapView } from '@/components/map/map-view';
import type { MapOutline, MapSite, MapSpan, NetworkMapData } from '@/components/map/map-types';

export type PlacedSite = MapSite & Point;
export type PlacedSpan = MapSpan & { from: Point; to: Point };
export type MapGeometry = { outlinePath: string | null; sites: PlacedSite[]; spans: PlacedSpan[] };

function outlineRings(outline: MapOutline | null): number[][][] {
  if (!outline) return [];
  return outline.type === 'Polygon' ? outline.coordinates : outline.coordinates.flat();
}

/**
 * Fits sites and outline (together) into the viewport, leaving room for glyphs and labels at the edges and
 * `topInsetPx` clear at the top (where narrow maps keep their buttons).
 */
export function fitNetwork(data: NetworkMapData, size: { widthPx: number; heightPx: number }, paddingPx: number, topInsetPx = 0): Projection {
  const points: LonLat[] = data.sites.map(({ lon, lat }) => ({ lon, lat }));
  for (const ring of outlineRings(data.outline)) for (const [lon, lat] of ring) points.push({ lon, lat });
  const inset = Math.min(topInsetPx, size.heightPx / 3);
  const fitted = fitProjection(points, { widthPx: size.widthPx, heightPx: size.heightPx - inset, paddingPx });
  if (inset === 0) return fitted;
  return { ...fitted, project: (p) => { const { x, y } = fitted.project(p); return { x, y: y + inset }; } };
}

function ringPath(ring: number[][], toScreen: (p: LonLat) => Point): string {
  const parts = ring.map(([lon, lat], i) => {
    const { x, y } = toScreen({ lon, lat });
    return `${i === 0 ? 'M' : 'L'}${x.toFixed(1)} ${y.toFixed(1)}`;
  });
  return `${parts.join('')}Z`;
}

/** Screen geometry; spans whose end sites are not in the data (a tenant's partial view) are left out. */
export function placeNetwork(data: NetworkMapData, projection: Projection, view: MapView): MapGeometry {
  const toScreen = (p: LonLat) => applyView(view, projection.project(p));
  const rings = outlineRings(data.outline);
  const sites = data.sites.map((site) => ({ ...site, ...toScreen(site) }));
  const byId = new Map(sites.map((s) => [s.id, s]));
  const spans: PlacedSpan[] = [];
  for (const span of data.spans) {
    const a = byId.get(span.a);
    const b = byId.get(span.b);
    if (a && b) spans.push({ ...span, from: { x: a.x, y: a.y }, to: { x: b.x, y: b.y } });
  }
  return { outlinePath: rings.length ? rings.map((r) => ringPath(r, toScreen)).join('') : null, sites, spans };
}
