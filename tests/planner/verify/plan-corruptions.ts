// Single corruptions of a valid plan, for the verifier's mutation properties. Each returns null when the plan
// offers nothing to corrupt that way (the property then skips the case).
import { buildInventory } from '../../../planner/model/build-inventory';
import type { SlicePlan } from '../../../planner/model/types';
import { windowCapacity } from '../../../planner/model/window-capacity';
import type { Scenario } from '../../../shared/scenario';
import type { Case, CaseParams } from './random-plan-case';

type Placement = Pick<SlicePlan, 'slice' | 'sites' | 'paths'>;

const choose = <T>(items: T[], pick: number): T | null => (items.length === 0 ? null : items[pick % items.length]);
const resolved = (c: Case) => c.plan.slices.filter((e) => e.outcome !== 'unresolved');
const sliceOf = (c: Case, id: string) => c.scenario.slices.find((s) => s.id === id)!;

/** Every slice where the plan leaves it: its entry, or its current placement; unresolved entries hold nothing. */
function finalPlacements(c: Case): Placement[] {
  const entries = new Map(c.plan.slices.map((e) => [e.slice, e]));
  return c.scenario.placements.flatMap((p) => {
    const e = entries.get(p.slice);
    if (e === undefined) return [p];
    return e.outcome === 'unresolved' ? [] : [e];
  });
}

/** Planned vCPU per site id and Gbit/s per span id. */
function plannedLoad(c: Case): { cpu: Map<string, number>; gbps: Map<string, number> } {
  const cpu = new Map<string, number>();
  const gbps = new Map<string, number>();
  for (const p of finalPlacements(c)) {
    const slice = sliceOf(c, p.slice);
    for (const f of slice.functions) cpu.set(p.sites[f.id], (cpu.get(p.sites[f.id]) ?? 0) + f.cpu);
    for (const t of slice.ties) for (const x of p.paths[t.id]) gbps.set(x, (gbps.get(x) ?? 0) + t.bandwidthGbps);
  }
  return { cpu, gbps };
}

/** A copy of the case whose plan entries can be edited freely. */
function withPlan(c: Case, edit: (entries: SlicePlan[]) => void): Case {
  const slices = structuredClone(c.plan.slices);
  edit(slices);
  return { ...c, plan: { affected: c.plan.affected, slices } };
}

/** A copy of the case with an edited scenario, compiled again (for anchors and latency budgets). */
function withScenario(c: Case, edit: (s: Scenario) => void): Case {
  const scenario = structuredClone(c.scenario);
  edit(scenario);
  return { ...c, scenario, inv: buildInventory(scenario) };
}

/** Reserve all but load × (1 − share) of one loaded site, or move a planned function onto a site without its room. */
export function overloadSite(c: Case, p: CaseParams): Case | null {
  const { cpu } = plannedLoad(c);
  const cap = windowCapacity(c.inv, c.window).siteCpu;
  const capOf = (id: string) => cap[c.inv.network.siteIndex.get(id)!];
  const reserve = [...cpu].filter(([, load]) => load > 0).map(([id, load]) => (): Case => (
    { ...c, reservations: { siteCpu: { [id]: capOf(id) - load * (1 - p.share) } } }));
  const moves = resolved(c).flatMap((e) => sliceOf(c, e.slice).functions.flatMap((f) => c.scenario.sites
    .filter((s) => s.id !== e.sites[f.id] && capOf(s.id) > 0 && capOf(s.id) - (cpu.get(s.id) ?? 0) < f.cpu - 1e-6)
    .map((s) => () => withPlan(c, (entries) => { entries.find((x) => x.slice === e.slice)!.sites[f.id] = s.id; }))));
  // Odd picks prefer a move when one exists: there are far fewer of them than loaded sites.
  const pool = p.pick % 2 === 1 && moves.length > 0 ? moves : reserve;
  return choose(pool, Math.floor(p.pick / 2))?.() ?? null;
}

/** Reserve all but load × (1 − share) of one loaded span. */
export function overloadSpan(c: Case, p: CaseParams): Case | null {
  const { gbps } = plannedLoad(c);
  const cap = windowCapacity(c.inv, c.window).spanGbps;
  const target = choose([...gbps].filter(([, load]) => load > 0), p.pick);
  if (target === null) return null;
  const [id, load] = target;
  return { ...c, reservations: { spanGbps: { [id]: cap[c.inv.network.spanIndex.get(id)!] - load * (1 - p.share) } } };
}

/** The sites a path visits from `start`, in order, or null where a span does not touch the site reached. */
function walk(c: Case, start: string, path: string[]): string[] | null {
  const spans = new Map(c.scenario.spans.map((s) => [s.id, s]));
  const visited = [start];
  for (const id of path) {
    const s = spans.get(id)!;
    const at = visited[visited.length - 1];
    if (s.a !== at && s.b !== at) return null;
    visited.push(s.a === at ? s.b : s.a);
  }
  return visited;
}

/** The path is a walk from `start` that visits no site twice (dropping or swapping a span then always breaks it). */
function isSimplePath(c: Case, start: string, path: string[]): boolean {
  const visited = walk(c, start, path);
  return visited !== null && new Set(visited).size === visited.length;
}

/** Sites a planned path passes through between its ends. */
function transitSites(c: Case, e: SlicePlan): string[] {
  return sliceOf(c, e.slice).ties.flatMap((t) => (walk(c, e.sites[t.from], e.paths[t.id]) ?? []).slice(1, -1));
}

/** Drop one span from, or swap two neighbouring spans of, a simple path of two or more spans. */
export function breakPath(c: Case, p: CaseParams): Case | null {
  const paths = resolved(c).flatMap((e) => sliceOf(c, e.slice).ties
    .filter((t) => e.paths[t.id].length >= 2 && isSimplePath(c, e.sites[t.from], e.paths[t.id]))
    .map((t) => ({ slice: e.slice, tie: t.id, length: e.paths[t.id].length })));
  const target = choose(paths, p.pick);
  if (target === null) return null;
  const at = Math.floor(p.share * (target.length - 1));
  return withPlan(c, (entries) => {
    const path = entries.find((x) => x.slice === target.slice)!.paths[target.tie];
    if (p.pick % 2 === 0) path.splice(at, 1);
    else [path[at], path[at + 1]] = [path[at + 1], path[at]];
  });
}

/**
 * Take down a site or span the plan uses (a site a path only passes through counts: its spans go down with it), or
 * move a planned function onto a site that is already down.
 */
export function useDownElement(c: Case, p: CaseParams): Case | null {
  const entries = resolved(c);
  const downSite = (id: string) => (): Case => ({ ...c, window: { ...c.window, downSites: [...c.window.downSites, id] } });
  const downSpan = (id: string) => (): Case => ({ ...c, window: { ...c.window, downSpans: [...c.window.downSpans, id] } });
  const onDown = (slice: string, fn: string, site: string) => () => withPlan(c, (all) => { all.find((x) => x.slice === slice)!.sites[fn] = site; });
  return choose([
    ...entries.flatMap((e) => Object.values(e.sites).map(downSite)),
    ...entries.flatMap((e) => Object.values(e.paths).flat().map(downSpan)),
    ...entries.flatMap((e) => transitSites(c, e).map(downSite)),
    ...entries.flatMap((e) => Object.keys(e.sites).flatMap((fn) => c.window.downSites.map((site) => onDown(e.slice, fn, site)))),
  ], p.pick)?.() ?? null;
}

export function dropFunction(c: Case, p: CaseParams): Case | null {
  const target = choose(resolved(c).flatMap((e) => Object.keys(e.sites).map((fn) => ({ slice: e.slice, fn }))), p.pick);
  if (target === null) return null;
  return withPlan(c, (entries) => { delete entries.find((x) => x.slice === target.slice)!.sites[target.fn]; });
}

/** Mean Earth radius (GRS80 R1, IUGG), to place a point anchor a known meridian arc away from a site. */
const EARTH_RADIUS_KM = 6371.0088;

/** Anchor a planned function to another site, or to a point due north or south of its site beyond the radius. */
export function breakAnchor(c: Case, p: CaseParams): Case | null {
  const target = choose(resolved(c).flatMap((e) => Object.entries(e.sites).map(([fn, site]) => ({ slice: e.slice, fn, site }))), p.pick);
  if (target === null) return null;
  const site = c.scenario.sites.find((s) => s.id === target.site)!;
  const others = c.scenario.sites.filter((s) => s.id !== site.id);
  const dLatDeg = (site.lat > 0 ? -1 : 1) * (0.01 + 2 * p.share);
  // Along a meridian the great-circle distance is exactly R·Δφ; the radius stops short of it.
  const arcKm = (EARTH_RADIUS_KM * Math.abs(dLatDeg) * Math.PI) / 180;
  const anchor = p.pick % 2 === 0 && others.length > 0
    ? { site: others[p.pick % others.length].id }
    : { lat: site.lat + dLatDeg, lon: site.lon, radiusKm: arcKm * (1 - Math.max(p.share, 0.01) / 2) };
  return withScenario(c, (s) => { s.slices.find((x) => x.id === target.slice)!.functions.find((f) => f.id === target.fn)!.anchor = anchor; });
}

/** Set one planned tie's budget to (1 − share) of its planned path latency. */
export function shrinkLatencyBudget(c: Case, p: CaseParams): Case | null {
  const ties = resolved(c).flatMap((e) => Object.entries(e.paths).filter(([, path]) => path.length > 0).map(([tie, path]) => ({ slice: e.slice, tie, path })));
  const target = choose(ties, p.pick);
  if (target === null) return null;
  const latencyMs = target.path.reduce((sum, id) => sum + c.inv.network.spans[c.inv.network.spanIndex.get(id)!].latencyMs, 0);
  return withScenario(c, (s) => { s.slices.find((x) => x.id === target.slice)!.ties.find((t) => t.id === target.tie)!.maxLatencyMs = latencyMs * (1 - p.share); });
}
