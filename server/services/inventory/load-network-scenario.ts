// The current inventory as a `slackwater-scenario/1` object (no windows); the inventory cache compiles it for the planner.
import {
  outlineSchema, SCENARIO_FORMAT, type Scenario, type ScenarioFunction, type ScenarioSlice, type ScenarioTie,
} from '../../../shared/scenario';
import { selectScenarioTables, type ScenarioTables } from '../../queries/inventory/scenario-tables';
import type { Queryable } from '../../../db/client';

// One collator for every comparison: localeCompare with options builds a new one per call (slow at thousands).
const natural = new Intl.Collator('en', { numeric: true });

/** Natural order ("sp-2" before "sp-10") so exports and lists read the way people number things. */
export const byNaturalId = (a: { id: string }, b: { id: string }) => natural.compare(a.id, b.id);

/** Omits a key whose value is null, so optional scenario fields stay absent rather than null. */
function present<T extends Record<string, unknown>>(obj: T): { [K in keyof T]: Exclude<T[K], null> } {
  return Object.fromEntries(Object.entries(obj).filter(([, v]) => v !== null && v !== undefined)) as never;
}

/** Functions have no stored order: follow the chain of ties (sorted), then the rest by id. */
function orderFunctions(functions: ScenarioFunction[], ties: ScenarioTie[]): ScenarioFunction[] {
  const byId = new Map(functions.map((f) => [f.id, f]));
  const ordered: ScenarioFunction[] = [];
  const take = (id: string) => {
    const f = byId.get(id);
    if (f) { ordered.push(f); byId.delete(id); }
  };
  for (const t of ties) { take(t.from); take(t.to); }
  return [...ordered, ...[...byId.values()].sort(byNaturalId)];
}

function pushTo<T>(groups: Map<string, T[]>, key: string, item: T): void {
  const list = groups.get(key);
  if (list) list.push(item);
  else groups.set(key, [item]);
}

function toSlices(t: ScenarioTables): ScenarioSlice[] {
  const functionsBySlice = new Map<string, ScenarioFunction[]>();
  for (const f of t.functionRows) {
    const fn = present({ id: f.id, name: f.name, cpu: f.cpu, anchor: f.anchor, moveCost: f.moveCost, fixed: f.fixed });
    pushTo(functionsBySlice, f.sliceId, fn);
  }
  const tiesBySlice = new Map<string, ScenarioTie[]>();
  for (const e of [...t.tieRows].sort(byNaturalId)) {
    const tie = present({
      id: e.id, from: e.fromFunction, to: e.toFunction, bandwidthGbps: e.bandwidthGbps,
      maxLatencyMs: e.maxLatencyMs, minAvailability: e.minAvailability,
    });
    pushTo(tiesBySlice, e.sliceId, tie);
  }
  return [...t.sliceRows].sort(byNaturalId).map((s) => {
    const ties = tiesBySlice.get(s.id) ?? [];
    return {
      ...present({ id: s.id, tenant: s.tenantId, name: s.name, sst: s.sst, sd: s.sd, priority: s.priority }),
      critical: s.critical,
      functions: orderFunctions(functionsBySlice.get(s.id) ?? [], ties),
      ties,
    };
  });
}

/** Site rows in natural id order, in the scenario's shape (shared with the GraphML export, which reads only these). */
export function toScenarioSites(rows: ScenarioTables['siteRows']): Scenario['sites'] {
  return [...rows].sort(byNaturalId).map((s) => present({
    id: s.id, name: s.name, kind: s.kind, lat: s.lat, lon: s.lon, cpu: s.cpu, mtbfHours: s.mtbfHours, mttrHours: s.mttrHours,
  }));
}

/** Span rows in natural id order, in the scenario's shape; an empty SRLG list stays absent. */
export function toScenarioSpans(rows: ScenarioTables['spanRows']): Scenario['spans'] {
  return [...rows].sort(byNaturalId).map((s) => ({
    ...present({
      id: s.id, a: s.siteA, b: s.siteB, capacityGbps: s.capacityGbps, lengthKm: s.lengthKm,
      latencyMs: s.latencyMs, mtbfHours: s.mtbfHours, mttrHours: s.mttrHours,
    }),
    ...(s.srlg.length > 0 ? { srlg: [...s.srlg] } : {}),
  }));
}

export function tablesToScenario(t: ScenarioTables): Scenario {
  const outline = t.meta?.outline == null ? undefined : outlineSchema.parse(t.meta.outline);
  return {
    format: SCENARIO_FORMAT,
    ...(t.meta?.name ? { name: t.meta.name } : {}),
    ...(outline ? { outline } : {}),
    sites: toScenarioSites(t.siteRows),
    spans: toScenarioSpans(t.spanRows),
    tenants: [...t.tenantRows].sort(byNaturalId).map((x) => ({
      id: x.id, name: x.name, noticeDays: x.noticeDays, ...(x.contacts.length > 0 ? { contacts: x.contacts } : {}),
    })),
    slices: toSlices(t),
    placements: [...t.placementRows]
      .sort((a, b) => natural.compare(a.sliceId, b.sliceId))
      .map((p) => ({ slice: p.sliceId, sites: p.sites, paths: p.paths })),
  };
}

/** The current network, tenants, slices and current placements, plus network_meta's name and outline. */
export async function loadNetworkScenario(db: Queryable): Promise<Scenario> {
  return tablesToScenario(await selectScenarioTables(db));
}
