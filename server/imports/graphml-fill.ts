// What the upload's defaults put in place of values a GraphML file lacks: a site kind by degree, a span length
// from its ends' coordinates.
import type { ScenarioSite } from '../../shared/scenario';
import { greatCircleKm, type LatLon } from '../../planner/geo/great-circle';

/** Shares of the file's sites, by degree rank: the most connected tenth core, the next 30 % aggregation. */
const CORE_PERCENT = 10;
const AGGREGATION_PERCENT = 30;

/** Ids compared as numbers when both are whole numbers ("2" before "10"), else as text. */
export function compareIds(a: string, b: string): number {
  if (/^\d+$/.test(a) && /^\d+$/.test(b) && a.length !== b.length) return a.length - b.length;
  return a < b ? -1 : a > b ? 1 : 0;
}

/**
 * Kind by degree: sites ranked by their number of spans in the file (descending, ties by id ascending); the first
 * ceil(10 %) core, the next ceil(30 %) aggregation, the rest edge. Percentages in whole numbers keep the
 * rounding exact (0.1 × 30 is a hair over 3 in floating point).
 */
export function kindsByDegree(siteIds: string[], spanEnds: { a: string; b: string }[]): Map<string, ScenarioSite['kind']> {
  const degree = new Map(siteIds.map((id) => [id, 0]));
  for (const { a, b } of spanEnds) {
    degree.set(a, (degree.get(a) ?? 0) + 1);
    if (b !== a) degree.set(b, (degree.get(b) ?? 0) + 1);
  }
  const ranked = [...siteIds].sort((x, y) => (degree.get(y) ?? 0) - (degree.get(x) ?? 0) || compareIds(x, y));
  const core = Math.ceil((ranked.length * CORE_PERCENT) / 100);
  const aggregation = Math.ceil((ranked.length * AGGREGATION_PERCENT) / 100);
  return new Map(ranked.map((id, rank) => [id, rank < core ? 'core' : rank < core + aggregation ? 'aggregation' : 'edge']));
}

/** Kilometres to 1 m: finer than any fibre record, and short enough to read. */
const KM_DECIMALS = 1000;

/** Fibre length estimate: great-circle distance between the ends × the route factor, in km. */
export function derivedLengthKm(a: LatLon, b: LatLon, routeFactor: number): number {
  return Math.round(greatCircleKm(a, b) * routeFactor * KM_DECIMALS) / KM_DECIMALS;
}
