// Spans of the demo network: a core triangle, an aggregation ring dual-homed to the core,
// dual-homed edge sites and cell-site spurs closed into small rings — a meshed ring-and-spur network.
import type { ScenarioSite, ScenarioSpan } from '../../shared/scenario';
import { greatCircleKm } from '../../shared/scenario-validate-usage';
import type { Rng } from './random';
import { between, round } from './random';

/** Fibre rarely runs straight: route length ≈ great-circle distance × 1.3. */
const ROUTE_FACTOR = 1.3;
/** Invented cut rate: one cut per ~2 000 000 km·h, so a 50 km span fails about every 40 000 h. */
const KM_HOURS_PER_CUT = 2_000_000;

export const distanceKm = (a: ScenarioSite, b: ScenarioSite): number => greatCircleKm(a.lat, a.lon, b.lat, b.lon);
const bearing = (from: ScenarioSite, to: ScenarioSite): number => Math.atan2(to.lat - from.lat, to.lon - from.lon);

function nearest(site: ScenarioSite, among: ScenarioSite[], count: number): ScenarioSite[] {
  return [...among].sort((p, q) => distanceKm(site, p) - distanceKm(site, q)).slice(0, count);
}

/** Sites of a kind in angular order around the island's centre, so "neighbours" are neighbours on the map. */
function aroundTheCoast(sites: ScenarioSite[]): ScenarioSite[] {
  const lat = sites.reduce((s, x) => s + x.lat, 0) / sites.length;
  const lon = sites.reduce((s, x) => s + x.lon, 0) / sites.length;
  return [...sites].sort((p, q) => Math.atan2(p.lat - lat, p.lon - lon) - Math.atan2(q.lat - lat, q.lon - lon));
}

export function makeSpans(sites: ScenarioSite[], rng: Rng): ScenarioSpan[] {
  const ofKind = (kind: ScenarioSite['kind']) => sites.filter((s) => s.kind === kind);
  const [core, agg, edge, cell] = [ofKind('core'), aggregationOrder(ofKind('aggregation')), ofKind('edge'), aroundTheCoast(ofKind('cell-site'))];
  const pairs: [ScenarioSite, ScenarioSite, number][] = [];
  const add = (a: ScenarioSite, b: ScenarioSite, capacityGbps: number) => {
    const taken = pairs.some(([p, q]) => (p === a && q === b) || (p === b && q === a));
    if (a !== b && !taken) pairs.push([a, b, capacityGbps]);
  };
  core.forEach((c, i) => add(c, core[(i + 1) % core.length], 100));
  agg.forEach((a, i) => {
    nearest(a, core, i % 2 === 0 ? 2 : 1).forEach((c) => add(a, c, 100));
    add(a, agg[(i + 1) % agg.length], 40);
  });
  edge.forEach((e) => nearest(e, agg, 2).forEach((a) => add(e, a, 40)));
  cell.forEach((c, i) => {
    add(c, nearest(c, [...edge, ...agg], 1)[0], 10);
    if (i % 2 === 0) add(c, cell[(i + 1) % cell.length], 10); // closes a small ring through two uplinks
  });
  return pairs.map(([a, b, capacityGbps], i) => {
    const lengthKm = round(distanceKm(a, b) * ROUTE_FACTOR, 1);
    return {
      id: `sp-${String(i + 1).padStart(3, '0')}`, a: a.id, b: b.id, capacityGbps, lengthKm,
      mtbfHours: Math.round(KM_HOURS_PER_CUT / lengthKm), mttrHours: round(between(rng, 6, 12), 1),
    };
  });
}

const aggregationOrder = aroundTheCoast;

/** Shared ducts: at a few hubs the two spans leaving in the most similar direction share a trench. */
export function tagSharedDucts(spans: ScenarioSpan[], sites: ScenarioSite[], hubIds: string[]): void {
  const byId = new Map(sites.map((s) => [s.id, s]));
  for (const hubId of hubIds) {
    const hub = byId.get(hubId)!;
    const leaving = spans.filter((s) => s.a === hubId || s.b === hubId);
    const angle = (s: ScenarioSpan) => bearing(hub, byId.get(s.a === hubId ? s.b : s.a)!);
    let best: [ScenarioSpan, ScenarioSpan] | null = null;
    let bestGap = Infinity;
    for (let i = 0; i < leaving.length; i++) {
      for (let j = i + 1; j < leaving.length; j++) {
        const d = Math.abs(angle(leaving[i]) - angle(leaving[j]));
        const gap = Math.min(d, 2 * Math.PI - d);
        if (gap < bestGap) [best, bestGap] = [[leaving[i], leaving[j]], gap];
      }
    }
    const tag = `duct-${hubId.replace(/^[a-z]+-/, '')}`;
    for (const span of best ?? []) span.srlg = [...(span.srlg ?? []), tag];
  }
}
