// Invented site locations with the spread of a settled region: most sites cluster around a few invented towns
// of unequal size, the rest are scattered over the countryside. Town centres come first in the list, biggest
// town first, so a growth model that starts from the first sites grows its hubs in the towns.
// Town sizes follow a rank-size (Zipf) rule, size ∝ 1 / rank — Reference: G. K. Zipf, "Human Behavior and the
// Principle of Least Effort", 1949 (memory); used here only for an invented, plausible spread.
import type { LatLon } from '../../planner/geo/great-circle';
import { createRng, type Rng } from '../../planner/random/rng';

export interface LatLonBox {
  latMin: number;
  latMax: number;
  lonMin: number;
  lonMax: number;
}

export interface TownSitesOptions {
  sites: number;
  seed: number;
  /** invented region; the default lies over open sea, so no real place is implied */
  box?: LatLonBox;
  /** number of towns (default: one per ~12 sites, at least 3) */
  towns?: number;
  /** share of sites outside any town */
  ruralShare?: number;
}

export interface TownSites {
  points: LatLon[];
  /** town of each site (-1 = countryside); sites 0 … towns−1 are the town centres */
  town: number[];
  towns: number;
}

export const TOWN_SITES_DEFAULTS = {
  box: { latMin: 40, latMax: 44, lonMin: -40, lonMax: -34 },
  ruralShare: 0.2,
  /** spread (σ) of the biggest town and of the smallest, km — invented */
  biggestTownKm: 30,
  smallestTownKm: 8,
};

/** km per degree of latitude on the mean sphere (2πR / 360 with R = 6371.0088 km). */
const KM_PER_DEG_LAT = 111.195;

/** Standard normal draw (Box–Muller). */
function gaussian(rng: Rng): number {
  const u = 1 - rng();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng());
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, x));

function uniformPoint(box: LatLonBox, rng: Rng): LatLon {
  return { lat: box.latMin + rng() * (box.latMax - box.latMin), lon: box.lonMin + rng() * (box.lonMax - box.lonMin) };
}

function around(centre: LatLon, sigmaKm: number, box: LatLonBox, rng: Rng): LatLon {
  const dLat = (gaussian(rng) * sigmaKm) / KM_PER_DEG_LAT;
  const dLon = (gaussian(rng) * sigmaKm) / (KM_PER_DEG_LAT * Math.cos((centre.lat * Math.PI) / 180));
  return { lat: clamp(centre.lat + dLat, box.latMin, box.latMax), lon: clamp(centre.lon + dLon, box.lonMin, box.lonMax) };
}

/** Index drawn with probability proportional to weights[i]. */
function drawWeighted(weights: number[], total: number, rng: Rng): number {
  let x = rng() * total;
  for (let i = 0; i < weights.length; i += 1) {
    x -= weights[i];
    if (x < 0) return i;
  }
  return weights.length - 1;
}

export function townSites(options: TownSitesOptions): TownSites {
  const o = { ...TOWN_SITES_DEFAULTS, ...options };
  if (!(Number.isInteger(o.sites) && o.sites >= 1)) throw new RangeError('townSites needs at least 1 site');
  const towns = Math.min(o.sites, o.towns ?? Math.max(3, Math.round(o.sites / 12)));
  const rng = createRng(o.seed);
  const size = Array.from({ length: towns }, (_, k) => 1 / (k + 1));
  const total = size.reduce((a, b) => a + b, 0);
  const sigmaKm = size.map((s) => o.smallestTownKm + (o.biggestTownKm - o.smallestTownKm) * s);
  const points: LatLon[] = [];
  const town: number[] = [];
  for (let k = 0; k < towns; k += 1) {
    points.push(uniformPoint(o.box, rng));
    town.push(k);
  }
  for (let i = towns; i < o.sites; i += 1) {
    if (rng() < o.ruralShare) {
      points.push(uniformPoint(o.box, rng));
      town.push(-1);
      continue;
    }
    const k = drawWeighted(size, total, rng);
    points.push(around(points[k], sigmaKm[k], o.box, rng));
    town.push(k);
  }
  return { points, town, towns };
}
