// Comparable forms of each entity (defaults filled in as the database stores them) and a checksum of a state.
import { createHash } from 'node:crypto';
import type { Scenario, ScenarioPlacement, ScenarioSite, ScenarioSlice, ScenarioSpan, ScenarioTenant } from '../../shared/scenario';

const byId = <T extends { id: string }>(items: T[]) => [...items].sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
const sortedRecord = <T>(r: Record<string, T>) => Object.fromEntries(Object.entries(r).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)));

export const canonicalSite = (s: ScenarioSite) => ({
  name: s.name, kind: s.kind, lat: s.lat, lon: s.lon, cpu: s.cpu, mtbfHours: s.mtbfHours ?? null, mttrHours: s.mttrHours ?? null,
});

export const canonicalSpan = (s: ScenarioSpan) => ({
  a: s.a, b: s.b, capacityGbps: s.capacityGbps, lengthKm: s.lengthKm, latencyMs: s.latencyMs ?? null,
  mtbfHours: s.mtbfHours ?? null, mttrHours: s.mttrHours ?? null, srlg: [...(s.srlg ?? [])].sort(),
});

export const canonicalTenant = (t: ScenarioTenant) => ({ name: t.name, noticeDays: t.noticeDays, contacts: t.contacts ?? [] });

/** SD FFFFFF means "no SD" (TS 23.003 §28.4.2), the same as leaving it out. */
const normalSd = (sd: string | undefined) => (sd === undefined || sd.toUpperCase() === 'FFFFFF' ? null : sd.toUpperCase());

export const canonicalSlice = (s: ScenarioSlice) => ({
  tenant: s.tenant, name: s.name, sst: s.sst, sd: normalSd(s.sd), priority: s.priority, critical: s.critical ?? false,
  functions: byId(s.functions).map((f) => ({
    id: f.id, name: f.name ?? null, cpu: f.cpu, anchor: f.anchor ?? null, moveCost: f.moveCost ?? 1, fixed: f.fixed ?? false,
  })),
  ties: byId(s.ties).map((t) => ({
    id: t.id, from: t.from, to: t.to, bandwidthGbps: t.bandwidthGbps, maxLatencyMs: t.maxLatencyMs, minAvailability: t.minAvailability ?? null,
  })),
});

export const canonicalPlacement = (p: ScenarioPlacement) => ({ sites: sortedRecord(p.sites), paths: sortedRecord(p.paths) });

/** How many rings and positions an outline has: enough to see that it changed without printing it. */
function outlineSummary(outline: Scenario['outline']): string | null {
  if (!outline) return null;
  const rings = outline.type === 'Polygon' ? outline.coordinates : outline.coordinates.flat();
  return `${outline.type}, ${rings.length} ring(s), ${rings.reduce((n, r) => n + r.length, 0)} positions, #${hash(JSON.stringify(outline)).slice(0, 8)}`;
}

export const canonicalNetwork = (s: Scenario) => ({ name: s.name ?? null, outline: outlineSummary(s.outline) });

export function hash(text: string): string {
  return createHash('sha256').update(text).digest('hex');
}

/** Checksum of a state in canonical form: equal exactly when every entity compares equal. */
export function scenarioChecksum(s: Scenario): string {
  return hash(JSON.stringify({
    network: canonicalNetwork(s),
    sites: byId(s.sites).map((x) => [x.id, canonicalSite(x)]),
    spans: byId(s.spans).map((x) => [x.id, canonicalSpan(x)]),
    tenants: byId(s.tenants).map((x) => [x.id, canonicalTenant(x)]),
    slices: byId(s.slices).map((x) => [x.id, canonicalSlice(x)]),
    placements: [...s.placements].sort((a, b) => (a.slice < b.slice ? -1 : 1)).map((p) => [p.slice, canonicalPlacement(p)]),
  }));
}
