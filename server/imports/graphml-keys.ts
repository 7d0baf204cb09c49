// The GraphML key names we read (case-insensitive `attr.name`, or the key id when undeclared), with units.
import type { ScenarioSite, ScenarioSpan } from '../../shared/scenario';

type Attrs = Record<string, unknown>;
export type KeyProblem = (message: string) => void;

/** Site field → accepted key names. */
export const NODE_KEYS = {
  name: ['name', 'label'],
  kind: ['kind', 'type'],
  lat: ['lat', 'latitude'],
  lon: ['lon', 'lng', 'long', 'longitude'],
  cpu: ['cpu', 'vcpu'],
  mtbfHours: ['mtbfhours', 'mtbf'],
  mttrHours: ['mttrhours', 'mttr'],
} as const;

/** Span field → accepted key names; `linkspeedraw` is in bit/s and converted to Gbit/s. */
export const EDGE_KEYS = {
  capacityGbps: ['capacitygbps', 'capacity'],
  lengthKm: ['lengthkm', 'length', 'distance'],
  latencyMs: ['latencyms', 'latency', 'delay'],
  mtbfHours: ['mtbfhours', 'mtbf'],
  mttrHours: ['mttrhours', 'mttr'],
  srlg: ['srlg'],
} as const;

const BITS_PER_GBIT = 1e9;

function lowerKeys(attrs: Attrs): Map<string, unknown> {
  return new Map(Object.entries(attrs).map(([k, v]) => [k.toLowerCase(), v]));
}

function pick(attrs: Map<string, unknown>, names: readonly string[]): unknown {
  for (const n of names) {
    const v = attrs.get(n);
    if (v !== undefined && v !== null && String(v).trim() !== '') return v;
  }
  return undefined;
}

function num(v: unknown, key: string, problem: KeyProblem): number | undefined {
  if (v === undefined) return undefined;
  const n = typeof v === 'number' ? v : Number(String(v).trim());
  if (!Number.isFinite(n)) problem(`key "${key}": "${String(v)}" is not a number`);
  return Number.isFinite(n) ? n : undefined;
}

const str = (v: unknown) => (v === undefined ? undefined : String(v).trim());

export function siteValues(raw: Attrs, problem: KeyProblem): Partial<ScenarioSite> {
  const a = lowerKeys(raw);
  const out: Partial<ScenarioSite> = {
    name: str(pick(a, NODE_KEYS.name)),
    kind: str(pick(a, NODE_KEYS.kind)) as ScenarioSite['kind'] | undefined,
    lat: num(pick(a, NODE_KEYS.lat), 'lat', problem),
    lon: num(pick(a, NODE_KEYS.lon), 'lon', problem),
    cpu: num(pick(a, NODE_KEYS.cpu), 'cpu', problem),
    mtbfHours: num(pick(a, NODE_KEYS.mtbfHours), 'mtbfHours', problem),
    mttrHours: num(pick(a, NODE_KEYS.mttrHours), 'mttrHours', problem),
  };
  return Object.fromEntries(Object.entries(out).filter(([, v]) => v !== undefined));
}

export function spanValues(raw: Attrs, problem: KeyProblem): Partial<ScenarioSpan> {
  const a = lowerKeys(raw);
  const bitsPerSecond = num(a.get('linkspeedraw'), 'LinkSpeedRaw', problem);
  const srlg = str(pick(a, EDGE_KEYS.srlg))?.split(/[\s;,]+/).filter(Boolean);
  const out: Partial<ScenarioSpan> = {
    capacityGbps: num(pick(a, EDGE_KEYS.capacityGbps), 'capacityGbps', problem) ?? (bitsPerSecond === undefined ? undefined : bitsPerSecond / BITS_PER_GBIT),
    lengthKm: num(pick(a, EDGE_KEYS.lengthKm), 'lengthKm', problem),
    latencyMs: num(pick(a, EDGE_KEYS.latencyMs), 'latencyMs', problem),
    mtbfHours: num(pick(a, EDGE_KEYS.mtbfHours), 'mtbfHours', problem),
    mttrHours: num(pick(a, EDGE_KEYS.mttrHours), 'mttrHours', problem),
    srlg: srlg && srlg.length > 0 ? srlg : undefined,
  };
  return Object.fromEntries(Object.entries(out).filter(([, v]) => v !== undefined));
}
