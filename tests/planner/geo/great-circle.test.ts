import fc from 'fast-check';
import turfDistance from '@turf/distance';
import { EARTH_MEAN_RADIUS_KM, greatCircleKm } from '../../../planner/geo/great-circle';

const dms = (deg: number, min: number) => deg + min / 60;

describe('greatCircleKm', () => {
  it('matches the LAX → JFK worked example', () => {
    // Ed Williams' Aviation Formulary (secondary): central angle 0.623585 rad; × 6371.0088 km → 3972.86 km.
    const lax = { lat: dms(33, 57), lon: -dms(118, 24) };
    const jfk = { lat: dms(40, 38), lon: -dms(73, 47) };
    expect(Math.abs(greatCircleKm(lax, jfk) - 3972.86)).toBeLessThan(0.5);
    expect(greatCircleKm(lax, jfk) / EARTH_MEAN_RADIUS_KM).toBeCloseTo(0.623585, 5);
  });

  it('is zero for a point and itself, and symmetric', () => {
    const p = { lat: 49.5, lon: 8.25 };
    const q = { lat: -12.25, lon: 130.5 };
    expect(greatCircleKm(p, p)).toBe(0);
    expect(greatCircleKm(p, q)).toBe(greatCircleKm(q, p));
  });

  it('agrees with @turf/distance (haversine, R = 6371008.8 m) on random points within 1e-6 relative', () => {
    // REFERENCES.md: @turf/distance uses the same radius and formula as our mean-radius haversine.
    const lat = fc.double({ min: -90, max: 90, noNaN: true });
    const lon = fc.double({ min: -180, max: 180, noNaN: true });
    fc.assert(
      fc.property(lat, lon, lat, lon, (lat1, lon1, lat2, lon2) => {
        const ours = greatCircleKm({ lat: lat1, lon: lon1 }, { lat: lat2, lon: lon2 });
        const turf = turfDistance([lon1, lat1], [lon2, lat2], { units: 'kilometers' });
        expect(Math.abs(ours - turf)).toBeLessThanOrEqual(1e-6 * Math.max(turf, 1e-3));
      }),
      { numRuns: 500 },
    );
  });
});
