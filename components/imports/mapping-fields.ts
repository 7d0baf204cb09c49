// Our site and span fields that a GraphML attribute can feed, as the mapping step names them, and the picks ↔ `mapping`.
import {
  MAPPABLE_SITE_FIELDS, MAPPABLE_SPAN_FIELDS, type ImportMapping, type MappableSiteField, type MappableSpanField,
} from '@/shared/imports';

export type MappingEntity = 'site' | 'span';

const SITE_FIELD_LABELS: Record<MappableSiteField, string> = {
  name: 'Name',
  kind: 'Kind',
  lat: 'Latitude (° WGS 84)',
  lon: 'Longitude (° WGS 84)',
  cpu: 'Compute (vCPU)',
  mtbfHours: 'MTBF (hours)',
  mttrHours: 'MTTR (hours)',
};

const SPAN_FIELD_LABELS: Record<MappableSpanField, string> = {
  capacityGbps: 'Capacity (Gbit/s)',
  lengthKm: 'Length (km)',
  latencyMs: 'Latency (ms)',
  mtbfHours: 'MTBF (hours)',
  mttrHours: 'MTTR (hours)',
  srlg: 'SRLG tags',
};

export const MAPPING_FIELDS: Record<MappingEntity, readonly { field: string; label: string }[]> = {
  site: MAPPABLE_SITE_FIELDS.map((field) => ({ field, label: SITE_FIELD_LABELS[field] })),
  span: MAPPABLE_SPAN_FIELDS.map((field) => ({ field, label: SPAN_FIELD_LABELS[field] })),
};

/** Per entity, our field → the file attribute picked for it; a field left out reads from our usual names. */
export type MappingPicks = { site: Record<string, string>; span: Record<string, string> };

/** The picks a preview starts with: what the server recognised, limited to attributes the file has. */
export function picksFromRecognised(recognised: MappingPicks, attributes: { site: readonly string[]; span: readonly string[] }): MappingPicks {
  const keep = (entity: MappingEntity) => Object.fromEntries(
    Object.entries(recognised[entity]).filter(([field, attr]) =>
      MAPPING_FIELDS[entity].some((f) => f.field === field) && attributes[entity].includes(attr)),
  );
  return { site: keep('site'), span: keep('span') };
}

/** The `mapping` to send: every picked field, or null when nothing is picked. */
export function mappingToSend(picks: MappingPicks): ImportMapping | null {
  const count = Object.keys(picks.site).length + Object.keys(picks.span).length;
  // The picks only ever hold our mappable fields (MAPPING_FIELDS drives the pickers), so the narrowing is sound.
  return count === 0 ? null : { site: { ...picks.site }, span: { ...picks.span } } as ImportMapping;
}

export function setPick(picks: MappingPicks, entity: MappingEntity, field: string, attribute: string | null): MappingPicks {
  const next = { ...picks[entity] };
  if (attribute === null) delete next[field];
  else next[field] = attribute;
  return { ...picks, [entity]: next };
}
