// The GraphML key names we read (case-insensitive `attr.name`, or the key id when undeclared), with units, and
// the upload's mapping (our field → the file's attribute name) that goes before them.
import type { ImportMapping, MappableSiteField, MappableSpanField } from '../../shared/imports';
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
} as const satisfies Record<MappableSiteField, readonly string[]>;

/** Span field → accepted key names; `linkspeedraw` is in bit/s and converted to Gbit/s. */
export const EDGE_KEYS = {
  capacityGbps: ['capacitygbps', 'capacity', 'linkspeedraw'],
  lengthKm: ['lengthkm', 'length', 'distance'],
  latencyMs: ['latencyms', 'latency', 'delay'],
  mtbfHours: ['mtbfhours', 'mtbf'],
  mttrHours: ['mttrhours', 'mttr'],
  srlg: ['srlg'],
} as const satisfies Record<MappableSpanField, readonly string[]>;

/** Keys whose unit is not our field's: the factor to ours (LinkSpeedRaw is bit/s, capacity is Gbit/s). */
const KEY_SCALE: Record<string, number> = { linkspeedraw: 1e-9 };
/** How a number-valued key was called before mapping existed; error messages keep these names. */
const KEY_LABEL: Record<string, string> = { linkspeedraw: 'LinkSpeedRaw' };

/** One value read from the file, and the attribute (as the file spells it) it came from. */
type Found = { value: unknown; attr: string; key: string; mapped: boolean };

/** Our field → the attribute it was read from, for the preview's `recognised`. */
export type Recognised = Record<string, string>;

function lowerKeys(attrs: Attrs): Map<string, { value: unknown; attr: string }> {
  return new Map(Object.entries(attrs).map(([k, v]) => [k.toLowerCase(), { value: v, attr: k }]));
}

/** The mapped attribute first, then our own names, in order; blank values count as absent. */
function pick(attrs: ReturnType<typeof lowerKeys>, names: readonly string[], mapped: string | undefined): Found | undefined {
  const order = mapped === undefined ? names : [mapped.toLowerCase(), ...names];
  for (const key of order) {
    const hit = attrs.get(key);
    if (hit && hit.value !== undefined && hit.value !== null && String(hit.value).trim() !== '') {
      return { ...hit, key, mapped: mapped !== undefined && key === mapped.toLowerCase() };
    }
  }
  return undefined;
}

function num(found: Found | undefined, field: string, problem: KeyProblem): number | undefined {
  if (found === undefined) return undefined;
  const v = found.value;
  const n = typeof v === 'number' ? v : Number(String(v).trim());
  if (!Number.isFinite(n)) {
    // Our own names are reported by our field name; a mapped attribute by the file's name for it.
    const label = found.mapped ? found.attr : KEY_LABEL[found.key] ?? field;
    problem(`key "${label}": "${String(v)}" is not a number`);
    return undefined;
  }
  return n * (KEY_SCALE[found.key] ?? 1);
}

const str = (found: Found | undefined) => (found === undefined ? undefined : String(found.value).trim());

function reader(raw: Attrs, mapping: Record<string, string | undefined> | undefined, recognised: Recognised) {
  const attrs = lowerKeys(raw);
  return <F extends string>(field: F, names: readonly string[]): Found | undefined => {
    const found = pick(attrs, names, mapping?.[field]);
    if (found && recognised[field] === undefined) recognised[field] = found.attr;
    return found;
  };
}

const defined = <T extends object>(o: T): Partial<T> => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;

export function siteValues(raw: Attrs, problem: KeyProblem, mapping?: ImportMapping['site'], recognised: Recognised = {}): Partial<ScenarioSite> {
  const read = reader(raw, mapping, recognised);
  return defined({
    name: str(read('name', NODE_KEYS.name)),
    kind: str(read('kind', NODE_KEYS.kind)) as ScenarioSite['kind'] | undefined,
    lat: num(read('lat', NODE_KEYS.lat), 'lat', problem),
    lon: num(read('lon', NODE_KEYS.lon), 'lon', problem),
    cpu: num(read('cpu', NODE_KEYS.cpu), 'cpu', problem),
    mtbfHours: num(read('mtbfHours', NODE_KEYS.mtbfHours), 'mtbfHours', problem),
    mttrHours: num(read('mttrHours', NODE_KEYS.mttrHours), 'mttrHours', problem),
  });
}

export function spanValues(raw: Attrs, problem: KeyProblem, mapping?: ImportMapping['span'], recognised: Recognised = {}): Partial<ScenarioSpan> {
  const read = reader(raw, mapping, recognised);
  const srlg = str(read('srlg', EDGE_KEYS.srlg))?.split(/[\s;,]+/).filter(Boolean);
  return defined({
    capacityGbps: num(read('capacityGbps', EDGE_KEYS.capacityGbps), 'capacityGbps', problem),
    lengthKm: num(read('lengthKm', EDGE_KEYS.lengthKm), 'lengthKm', problem),
    latencyMs: num(read('latencyMs', EDGE_KEYS.latencyMs), 'latencyMs', problem),
    mtbfHours: num(read('mtbfHours', EDGE_KEYS.mtbfHours), 'mtbfHours', problem),
    mttrHours: num(read('mttrHours', EDGE_KEYS.mttrHours), 'mttrHours', problem),
    srlg: srlg && srlg.length > 0 ? srlg : undefined,
  });
}
