// Inventory API contract, lists: query parameters, the list envelope, and site/span/slice/tenant rows.
import { z } from 'zod';
import { SITE_KINDS } from './scenario';

export const MAX_PAGE_SIZE = 200;
export const DEFAULT_PAGE_SIZE = 50;
export const SORT_ORDERS = ['asc', 'desc'] as const;

/** Query-string booleans: only the words "true"/"false" (and 1/0), never JavaScript truthiness. */
const queryBoolean = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

/** Common list parameters; `sort` is checked per resource against its own columns. */
function listQuery<const S extends readonly [string, ...string[]]>(sortKeys: S) {
  return z.object({
    page: z.coerce.number().int().min(1).default(1),
    pageSize: z.coerce.number().int().min(1).max(MAX_PAGE_SIZE).default(DEFAULT_PAGE_SIZE),
    sort: z.enum(sortKeys).default(sortKeys[0]),
    order: z.enum(SORT_ORDERS).default('asc'),
    /** case-insensitive search over ids and names */
    q: z.string().trim().max(200).optional(),
  });
}

/** Every list answers `{ items, total, page, pageSize }`; `total` counts all matches, not just this page. */
export function listEnvelope<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int().min(0),
    page: z.number().int().min(1),
    pageSize: z.number().int().min(1),
  });
}

/** `:id` route parameter of every detail route. */
export const inventoryIdParamSchema = z.object({ id: z.string().min(1).max(200) });

const ratio = z.number().min(0); // used ÷ capacity; above 1 when over-booked

// ---- sites ---------------------------------------------------------------------------------------
export const SITE_SORT_KEYS = ['id', 'name', 'kind', 'cpu', 'cpuUsed', 'utilisation', 'spanCount', 'sliceCount'] as const;
export const siteListQuerySchema = listQuery(SITE_SORT_KEYS).extend({ kind: z.enum(SITE_KINDS).optional() });

/**
 * A site with its compute load. For a tenant user, `cpuUsed`, `utilisation` and `sliceCount` count
 * its own slices only (other tenants' figures never leave the server).
 */
export const siteRowSchema = z.object({
  id: z.string(),
  name: z.string(),
  kind: z.enum(SITE_KINDS),
  lat: z.number(),
  lon: z.number(),
  cpu: z.number(),
  cpuUsed: z.number(),
  utilisation: ratio,
  mtbfHours: z.number().nullable(),
  mttrHours: z.number().nullable(),
  spanCount: z.number().int(),
  /** slices with a function hosted here */
  sliceCount: z.number().int(),
});
export const siteListSchema = listEnvelope(siteRowSchema);

// ---- spans ---------------------------------------------------------------------------------------
export const SPAN_SORT_KEYS = [
  'id', 'a', 'b', 'capacityGbps', 'lengthKm', 'latencyMs', 'usedGbps', 'utilisation', 'sliceCount',
] as const;
export const spanListQuerySchema = listQuery(SPAN_SORT_KEYS).extend({
  /** spans with this site at either end */
  site: z.string().min(1).optional(),
  srlg: z.string().min(1).optional(),
});

/** A span with its bandwidth load; tenant users see their own slices' load only (as for sites). */
export const spanRowSchema = z.object({
  id: z.string(),
  a: z.string(),
  b: z.string(),
  aName: z.string(),
  bName: z.string(),
  capacityGbps: z.number(),
  lengthKm: z.number(),
  /** as given, or derived from length at the fibre planning value */
  latencyMs: z.number(),
  latencyDerived: z.boolean(),
  mtbfHours: z.number().nullable(),
  mttrHours: z.number().nullable(),
  srlg: z.array(z.string()),
  /** Σ bandwidth of the ties routed over it (both directions share the capacity) */
  usedGbps: z.number(),
  utilisation: ratio,
  sliceCount: z.number().int(),
});
export const spanListSchema = listEnvelope(spanRowSchema);

// ---- slices --------------------------------------------------------------------------------------
export const SLICE_SORT_KEYS = [
  'id', 'name', 'tenant', 'sst', 'priority', 'critical', 'functionCount', 'cpu', 'bandwidthGbps', 'revision',
] as const;
export const sliceListQuerySchema = listQuery(SLICE_SORT_KEYS).extend({
  tenant: z.string().min(1).optional(),
  sst: z.coerce.number().int().min(1).max(255).optional(),
  priority: z.coerce.number().int().min(1).max(5).optional(),
  critical: queryBoolean.optional(),
});

export const sliceRowSchema = z.object({
  id: z.string(),
  name: z.string(),
  tenantId: z.string(),
  tenantName: z.string(),
  sst: z.number().int(),
  /** 6 hex digits, or null for "no SD" */
  sd: z.string().nullable(),
  priority: z.number().int(),
  critical: z.boolean(),
  status: z.string(),
  functionCount: z.number().int(),
  tieCount: z.number().int(),
  /** Σ vCPU of its functions */
  cpu: z.number(),
  /** Σ bandwidth of its ties */
  bandwidthGbps: z.number(),
  /** revision of the current placement; null when it has none */
  revision: z.number().int().nullable(),
});
export const sliceListSchema = listEnvelope(sliceRowSchema);

// ---- tenants -------------------------------------------------------------------------------------
export const TENANT_SORT_KEYS = ['id', 'name', 'noticeDays', 'sliceCount', 'criticalSliceCount'] as const;
export const tenantListQuerySchema = listQuery(TENANT_SORT_KEYS);

export const tenantRowSchema = z.object({
  id: z.string(),
  name: z.string(),
  noticeDays: z.number().int(),
  contactCount: z.number().int(),
  sliceCount: z.number().int(),
  criticalSliceCount: z.number().int(),
});
export const tenantListSchema = listEnvelope(tenantRowSchema);
