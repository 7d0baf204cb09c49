// Great-circle distance between two WGS 84 points on a spherical Earth (haversine form).
// Reference: R. W. Sinnott, "Virtues of the Haversine", Sky & Telescope 68(2), 1984; mean radius R1 of GRS80 (IUGG).

/** Mean Earth radius R1 = 6 371 008.7714 m (GRS80), rounded as the reference libraries do. */
export const EARTH_MEAN_RADIUS_KM = 6371.0088;

const RAD_PER_DEG = Math.PI / 180;

export interface LatLon {
  lat: number;
  lon: number;
}

export function greatCircleKm(a: LatLon, b: LatLon): number {
  const phi1 = a.lat * RAD_PER_DEG;
  const phi2 = b.lat * RAD_PER_DEG;
  const dPhi = phi2 - phi1;
  const dLambda = (b.lon - a.lon) * RAD_PER_DEG;
  const h = Math.sin(dPhi / 2) ** 2 + Math.cos(phi1) * Math.cos(phi2) * Math.sin(dLambda / 2) ** 2;
  // min() guards against rounding pushing h a hair above 1 for antipodal points.
  return 2 * EARTH_MEAN_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}
