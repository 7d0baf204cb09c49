// The verifier's own anchor check, with its own great-circle distance, so a planner geometry bug cannot pass both.
// Reference: R. W. Sinnott, "Virtues of the Haversine", Sky & Telescope 68(2), 1984; mean radius R1 of GRS80 (IUGG).
import type { AnchorInfo, NetworkModel } from '../model/types';

/** Mean Earth radius R1 = 6 371 008.7714 m (GRS80), rounded as the reference libraries round it. */
const MEAN_EARTH_RADIUS_KM = 6371.0088;
const RADIANS_PER_DEGREE = Math.PI / 180;

/** Haversine distance on a sphere of the mean Earth radius. */
export function haversineKm(from: { lat: number; lon: number }, to: { lat: number; lon: number }): number {
  const lat1 = from.lat * RADIANS_PER_DEGREE;
  const lat2 = to.lat * RADIANS_PER_DEGREE;
  const sinHalfDLat = Math.sin((lat2 - lat1) / 2);
  const sinHalfDLon = Math.sin(((to.lon - from.lon) * RADIANS_PER_DEGREE) / 2);
  const h = sinHalfDLat * sinHalfDLat + Math.cos(lat1) * Math.cos(lat2) * sinHalfDLon * sinHalfDLon;
  // Rounding can push h a hair above 1 for near-antipodal points, where asin would give NaN.
  return 2 * MEAN_EARTH_RADIUS_KM * Math.asin(Math.sqrt(Math.min(1, h)));
}

/** A site anchor must be that very site; a point anchor must lie within radiusKm of the site. */
export function anchorHolds(network: NetworkModel, anchor: AnchorInfo | undefined, site: number): boolean {
  if (anchor === undefined) return true;
  if ('site' in anchor) return anchor.site === site;
  const at = network.sites[site];
  return at !== undefined && haversineKm(at, anchor) <= anchor.radiusKm;
}
