// Equirectangular projection fitted to a viewport: longitudes shrunk by cos(mean latitude) so a region's shape reads true.
// Reference: the equirectangular (plate carrée with standard parallel) projection, x = R·λ·cos φ₁, y = R·φ.

export type LonLat = { lon: number; lat: number };
export type Point = { x: number; y: number };
export type Viewport = { widthPx: number; heightPx: number; paddingPx?: number };

export type Projection = {
  project: (p: LonLat) => Point;
  /** Pixels per degree of latitude (the north–south scale). */
  pxPerDegLat: number;
  /** cos of the standard parallel: how much a degree of longitude is shorter than one of latitude. */
  lonScale: number;
};

type Bounds = { minLon: number; maxLon: number; minLat: number; maxLat: number };

const DEG_TO_RAD = Math.PI / 180;
// A lone point (or a single line of points) has no extent; show about this many degrees around it.
const MIN_EXTENT_DEG = 0.01;

export function boundsOf(points: readonly LonLat[]): Bounds | null {
  const finite = points.filter((p) => Number.isFinite(p.lon) && Number.isFinite(p.lat));
  if (finite.length === 0) return null;
  const lons = finite.map((p) => p.lon);
  const lats = finite.map((p) => p.lat);
  return { minLon: Math.min(...lons), maxLon: Math.max(...lons), minLat: Math.min(...lats), maxLat: Math.max(...lats) };
}

/**
 * Fits every point into the viewport (less padding), centred, keeping the aspect ratio of the projected shape.
 * The standard parallel is the middle of the latitude range, so a region far from the equator is not stretched sideways.
 * With no points, returns a projection that puts everything at the viewport's centre.
 */
export function fitProjection(points: readonly LonLat[], viewport: Viewport): Projection {
  const paddingPx = viewport.paddingPx ?? 0;
  const innerW = Math.max(1, viewport.widthPx - 2 * paddingPx);
  const innerH = Math.max(1, viewport.heightPx - 2 * paddingPx);
  const centre = { x: viewport.widthPx / 2, y: viewport.heightPx / 2 };
  const bounds = boundsOf(points);
  if (!bounds) return { project: () => ({ ...centre }), pxPerDegLat: 1, lonScale: 1 };

  const midLat = (bounds.minLat + bounds.maxLat) / 2;
  const midLon = (bounds.minLon + bounds.maxLon) / 2;
  const lonScale = Math.cos(midLat * DEG_TO_RAD);
  const spanX = Math.max((bounds.maxLon - bounds.minLon) * lonScale, MIN_EXTENT_DEG);
  const spanY = Math.max(bounds.maxLat - bounds.minLat, MIN_EXTENT_DEG);
  const pxPerDegLat = Math.min(innerW / spanX, innerH / spanY);

  return {
    pxPerDegLat,
    lonScale,
    project: ({ lon, lat }) => ({
      x: centre.x + (lon - midLon) * lonScale * pxPerDegLat,
      // Screen y grows downwards while latitude grows northwards.
      y: centre.y - (lat - midLat) * pxPerDegLat,
    }),
  };
}
