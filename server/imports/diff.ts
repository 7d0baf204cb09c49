// Adds, changes (field by field, before → after) and removes between the current state and the target.
import type { EntityChange, EntityDiff, FieldChange, ScenarioDiff } from '../../shared/imports';
import type { Scenario } from '../../shared/scenario';
import {
  canonicalNetwork, canonicalPlacement, canonicalSite, canonicalSlice, canonicalSpan, canonicalTenant,
} from './canonical';

export type { EntityDiff, ScenarioDiff };

type Leaf = string | number | boolean | null | unknown[];

/** Flattens to dotted fields; arrays of objects with ids are keyed by id (`functions[f1].cpu`). */
function flatten(value: unknown, prefix: string, out: Map<string, Leaf>): Map<string, Leaf> {
  if (Array.isArray(value) && value.every((v) => typeof v === 'object' && v !== null && 'id' in v)) {
    for (const item of value as { id: string }[]) {
      const { id, ...rest } = item;
      flatten(rest, `${prefix}[${id}]`, out);
      if (Object.keys(rest).length === 0) out.set(`${prefix}[${id}]`, true);
    }
    if (value.length === 0) out.set(prefix, []);
  } else if (typeof value === 'object' && value !== null && !Array.isArray(value)) {
    for (const [k, v] of Object.entries(value)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else {
    out.set(prefix, value as Leaf);
  }
  return out;
}

export function fieldChanges(before: unknown, after: unknown): FieldChange[] {
  const a = flatten(before, '', new Map());
  const b = flatten(after, '', new Map());
  const fields = [...new Set([...a.keys(), ...b.keys()])];
  return fields
    .filter((f) => JSON.stringify(a.get(f) ?? null) !== JSON.stringify(b.get(f) ?? null))
    .map((f) => ({ field: f, before: a.get(f) ?? null, after: b.get(f) ?? null }));
}

function diffEntities<T>(before: T[], after: T[], key: (x: T) => string, canon: (x: T) => unknown): EntityDiff {
  const old = new Map(before.map((x) => [key(x), x]));
  const now = new Map(after.map((x) => [key(x), x]));
  const changes: EntityChange[] = [];
  for (const [id, x] of now) {
    const prev = old.get(id);
    if (!prev) continue;
    const fields = fieldChanges(canon(prev), canon(x));
    if (fields.length > 0) changes.push({ id, fields });
  }
  return {
    adds: [...now.keys()].filter((id) => !old.has(id)),
    changes,
    removes: [...old.keys()].filter((id) => !now.has(id)),
  };
}

export function diffScenarios(before: Scenario, after: Scenario): ScenarioDiff {
  const id = (x: { id: string }) => x.id;
  const network = fieldChanges(canonicalNetwork(before), canonicalNetwork(after));
  return {
    sites: diffEntities(before.sites, after.sites, id, canonicalSite),
    spans: diffEntities(before.spans, after.spans, id, canonicalSpan),
    tenants: diffEntities(before.tenants, after.tenants, id, canonicalTenant),
    slices: diffEntities(before.slices, after.slices, id, canonicalSlice),
    placements: diffEntities(before.placements, after.placements, (p) => p.slice, canonicalPlacement),
    network: { adds: [], changes: network.length > 0 ? [{ id: 'network', fields: network }] : [], removes: [] },
  };
}

export function emptyDiff(): ScenarioDiff {
  const e = (): EntityDiff => ({ adds: [], changes: [], removes: [] });
  return { sites: e(), spans: e(), tenants: e(), slices: e(), placements: e(), network: e() };
}
