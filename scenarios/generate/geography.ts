// The invented Ambry Coast: a wiggly landmass far out in open ocean and the operator's sites placed on it.
import type { ScenarioSite } from '../../shared/scenario';
import type { Rng } from './random';
import { between, round } from './random';

// Open North Atlantic: nowhere near any real coast, so nothing on the map can be mistaken for a real place.
const CENTRE_LAT = 55.4;
const CENTRE_LON = -27.0;
const KM_PER_DEG_LAT = 111.2;
const HALF_WIDTH_KM = 130;
const HALF_HEIGHT_KM = 80;
const WIGGLES = [
  { k: 3, amp: 0.07 }, { k: 5, amp: 0.05 }, { k: 8, amp: 0.03 }, { k: 13, amp: 0.018 }, { k: 21, amp: 0.01 },
];

export interface Coast {
  /** Distance in km from the centre to the shore in direction `theta` (radians, east = 0, counter-clockwise). */
  shoreKm(theta: number): number;
}

export function makeCoast(rng: Rng): Coast {
  const phases = WIGGLES.map(() => between(rng, 0, 2 * Math.PI));
  return {
    shoreKm(theta) {
      const ellipse = (HALF_WIDTH_KM * HALF_HEIGHT_KM) /
        Math.hypot(HALF_HEIGHT_KM * Math.cos(theta), HALF_WIDTH_KM * Math.sin(theta));
      const wiggle = WIGGLES.reduce((sum, w, i) => sum + w.amp * Math.sin(w.k * theta + phases[i]), 1);
      return ellipse * wiggle;
    },
  };
}

/** Local east/north km → WGS 84 (an equirectangular approximation is plenty at this size). */
export function toLatLon(xKm: number, yKm: number): { lat: number; lon: number } {
  const lat = CENTRE_LAT + yKm / KM_PER_DEG_LAT;
  const lon = CENTRE_LON + xKm / (KM_PER_DEG_LAT * Math.cos((CENTRE_LAT * Math.PI) / 180));
  return { lat: round(lat, 5), lon: round(lon, 5) };
}

/** The land as a GeoJSON Polygon: one closed, counter-clockwise ring of [lon, lat] (RFC 7946 order). */
export function outlinePolygon(coast: Coast, points = 180): { type: 'Polygon'; coordinates: number[][][] } {
  const ring: number[][] = [];
  for (let i = 0; i < points; i++) {
    const theta = (2 * Math.PI * i) / points;
    const r = coast.shoreKm(theta);
    const { lat, lon } = toLatLon(r * Math.cos(theta), r * Math.sin(theta));
    ring.push([round(lon, 4), round(lat, 4)]);
  }
  ring.push([...ring[0]]);
  return { type: 'Polygon', coordinates: [ring] };
}

const NAMES: Record<ScenarioSite['kind'], string[]> = {
  core: ['Vellaport', 'Orrindale', 'Castrenholm'],
  aggregation: ['Mirrowick', 'Tamsby Cross', 'Quellhaven', 'Drennock', 'Brisk Harbour', 'Lowen Ferris', 'Ambrymarsh', 'Sollowmere'],
  edge: ['Fennick Ridge', 'Tollymere', 'Skarrowby', 'Vennet Bay', 'Brindlecove', 'Ostry Head', 'Caddowmouth', 'Lirrenford',
    'Haskelby Point', 'Quarrowdene'],
  'cell-site': ['Pellow Sands', 'Ettering', 'Crannock Quay', 'Nessary', 'Wrelling', 'Ulverhythe', 'Dunmarrow', 'Gossel End',
    'Thimbrel', 'Harrowsent Cove', 'Kellorrin', 'Merrisand', 'Oakenvey', 'Pindlewick', 'Rossamere', 'Selkinby',
    'Talloway Strand', 'Umbrell Cross', 'Varrick Flats', 'Whistrel', 'Yarrowmouth', 'Abberlin Hythe', 'Bexmarrow', 'Dorrant Bay'],
};

/** Where each kind sits: angle offset, jitter (degrees) and how far out towards the shore (fraction of the shore distance). */
const LAYOUT: Record<ScenarioSite['kind'], { offsetDeg: number; jitterDeg: number; fraction: [number, number] }> = {
  core: { offsetDeg: 20, jitterDeg: 10, fraction: [0.22, 0.32] },
  aggregation: { offsetDeg: 0, jitterDeg: 8, fraction: [0.52, 0.62] },
  edge: { offsetDeg: 18, jitterDeg: 6, fraction: [0.7, 0.78] },
  'cell-site': { offsetDeg: 7, jitterDeg: 4, fraction: [0.84, 0.92] },
};

const CPU: Record<ScenarioSite['kind'], number> = { core: 640, aggregation: 256, edge: 192, 'cell-site': 32 };
const FAILURE: Record<ScenarioSite['kind'], { mtbfHours: number; mttrHours: number }> = {
  core: { mtbfHours: 150000, mttrHours: 2 },
  aggregation: { mtbfHours: 100000, mttrHours: 3 },
  edge: { mtbfHours: 80000, mttrHours: 4 },
  'cell-site': { mtbfHours: 50000, mttrHours: 6 },
};
const PREFIX: Record<ScenarioSite['kind'], string> = { core: 'core', aggregation: 'agg', edge: 'edge', 'cell-site': 'cell' };

export const slug = (name: string): string => name.toLowerCase().replace(/[^a-z0-9]+/g, '-');

export function makeSites(coast: Coast, rng: Rng): ScenarioSite[] {
  const sites: ScenarioSite[] = [];
  for (const kind of Object.keys(NAMES) as ScenarioSite['kind'][]) {
    const { offsetDeg, jitterDeg, fraction } = LAYOUT[kind];
    NAMES[kind].forEach((name, i) => {
      const deg = offsetDeg + (360 * i) / NAMES[kind].length + between(rng, -jitterDeg, jitterDeg);
      const theta = (deg * Math.PI) / 180;
      const r = coast.shoreKm(theta) * between(rng, fraction[0], fraction[1]);
      const { lat, lon } = toLatLon(r * Math.cos(theta), r * Math.sin(theta));
      const mtbfHours = Math.round(FAILURE[kind].mtbfHours * between(rng, 0.8, 1.2));
      sites.push({ id: `${PREFIX[kind]}-${slug(name)}`, name, kind, lat, lon, cpu: CPU[kind], mtbfHours, mttrHours: FAILURE[kind].mttrHours });
    });
  }
  return sites;
}
