// The preview's `sources` of a GraphML import: per value whether it came from the file, a default or a derivation,
// their counts, the values as filled in, and the file's attribute names for the mapping step.
import {
  MAPPABLE_SITE_FIELDS, MAPPABLE_SPAN_FIELDS, type ImportDefaults, type ImportSourceItems, type ImportSources, type ScenarioDiff, type ValueSource,
} from '../../shared/imports';
import { printableText } from '../../shared/safe-text';
import { FIBRE_MS_PER_KM, type Scenario } from '../../shared/scenario';
import type { FilledItems, ValueSources } from './merge-graphml';
import type { GraphmlNames } from './types';

type Counts = Record<ValueSource, number>;
const zero = (): Counts => ({ file: 0, default: 0, derived: 0 });

/** Ids the import adds or changes; without a result (the preview has errors) every id of the file counts. */
function countedIds(values: Record<string, unknown>, diff: { adds: string[]; changes: { id: string }[] } | null): Set<string> {
  return diff ? new Set([...diff.adds, ...diff.changes.map((c) => c.id)]) : new Set(Object.keys(values));
}

function fieldCounts(entity: 'sites' | 'spans', order: readonly string[], values: ValueSources[typeof entity], ids: Set<string>) {
  const perField = new Map(order.map((f) => [f, zero()]));
  for (const id of ids) {
    for (const [field, source] of Object.entries(values[id] ?? {})) perField.get(field)![source] += 1;
  }
  return [...perField].filter(([, c]) => c.file + c.default + c.derived > 0).map(([field, c]) => ({ entity, field, ...c }));
}

/** Latency as the format derives it (length × 5 µs/km), to a nanosecond so the figure reads cleanly. */
const latencyMs = (span: FilledItems['spans'][number]) =>
  span.latencyMs ?? (span.lengthKm === undefined ? null : Math.round(span.lengthKm * FIBRE_MS_PER_KM * 1e6) / 1e6);

function items(filled: FilledItems, before: Scenario): ImportSourceItems {
  const names = new Map(before.sites.map((s) => [s.id, s.name]));
  for (const s of filled.sites) if (s.id && s.name) names.set(s.id, s.name);
  return {
    sites: filled.sites.map((s) => ({ id: s.id!, name: s.name ?? null, kind: s.kind ?? null, cpu: s.cpu ?? null, lat: s.lat ?? null, lon: s.lon ?? null })),
    spans: filled.spans.map((s) => ({
      id: s.id!, a: s.a!, b: s.b!, aName: names.get(s.a!) ?? null, bName: names.get(s.b!) ?? null,
      capacityGbps: s.capacityGbps ?? null, lengthKm: s.lengthKm ?? null, latencyMs: latencyMs(s),
    })),
  };
}

const printableList = (names: string[]) => names.map(printableText);
const printableRecord = (r: Record<string, string>) => Object.fromEntries(Object.entries(r).map(([k, v]) => [k, printableText(v)]));

export function importSources(input: {
  names: GraphmlNames; merged: { values: ValueSources; filled: FilledItems } | null; diff: ScenarioDiff | null;
  defaults: ImportDefaults | undefined; before: Scenario;
}): ImportSources {
  const { names, merged, diff, defaults, before } = input;
  const values = merged?.values ?? { sites: {}, spans: {} };
  const fields = [
    ...fieldCounts('sites', MAPPABLE_SITE_FIELDS, values.sites, countedIds(values.sites, diff?.sites ?? null)),
    ...fieldCounts('spans', MAPPABLE_SPAN_FIELDS, values.spans, countedIds(values.spans, diff?.spans ?? null)),
  ];
  const counts = zero();
  for (const f of fields) for (const k of ['file', 'default', 'derived'] as const) counts[k] += f[k];
  const sources: ImportSources = {
    counts, fields, values,
    attributes: { site: printableList(names.attributes.site), span: printableList(names.attributes.span) },
    recognised: { site: printableRecord(names.recognised.site), span: printableRecord(names.recognised.span) },
  };
  if (defaults) sources.defaults = defaults;
  if (merged) sources.items = items(merged.filled, before);
  return sources;
}
