// Inventory API contract, details: site, span, slice and tenant detail answers, and the network map.
import { z } from 'zod';
import { outlineSchema, SITE_KINDS } from './scenario';
import { siteRowSchema, sliceRowSchema, spanRowSchema, tenantRowSchema } from './inventory-lists';

const ratio = z.number().min(0); // used ÷ capacity; above 1 when over-booked

// ---- details -------------------------------------------------------------------------------------
/** A slice's use of one element, for "what uses this" panels. */
export const sliceUseSchema = z.object({
  sliceId: z.string(),
  sliceName: z.string(),
  tenantId: z.string(),
  tenantName: z.string(),
  critical: z.boolean(),
  /** functions hosted at the site (site detail, hosted list) */
  functions: z.array(z.object({ id: z.string(), name: z.string().nullable(), cpu: z.number() })),
  /** ties routed over the span or through the site */
  ties: z.array(z.object({ id: z.string(), bandwidthGbps: z.number() })),
});

export const siteDetailSchema = z.object({
  site: siteRowSchema,
  spans: z.array(spanRowSchema),
  /** slices with functions on this site */
  hosted: z.array(sliceUseSchema),
  /** slices with a tie whose path passes through this site (an interior site of the path) */
  transit: z.array(sliceUseSchema),
});

export const spanDetailSchema = z.object({
  span: spanRowSchema,
  slices: z.array(sliceUseSchema),
});

const anchorViewSchema = z.union([
  z.object({ site: z.string() }),
  z.object({ lat: z.number(), lon: z.number(), radiusKm: z.number() }),
]);

export const sliceFunctionViewSchema = z.object({
  id: z.string(),
  name: z.string().nullable(),
  cpu: z.number(),
  anchor: anchorViewSchema.nullable(),
  moveCost: z.number(),
  fixed: z.boolean(),
  /** current site; null when the slice has no current placement */
  siteId: z.string().nullable(),
  siteName: z.string().nullable(),
});

export const sliceTieViewSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.string(),
  bandwidthGbps: z.number(),
  maxLatencyMs: z.number(),
  minAvailability: z.number().nullable(),
  path: z.object({
    /** span ids in order from the `from` function's site */
    spans: z.array(z.string()),
    /** site ids visited, from the `from` function's site to the `to` function's site */
    sites: z.array(z.string()),
    latencyMs: z.number(),
    /** series availability of the spans on the path (as the planner checks a tie's minimum) */
    availability: z.number(),
  }).nullable(),
});

export const placementRevisionSchema = z.object({
  revision: z.number().int(),
  current: z.boolean(),
  reason: z.string(),
  createdAt: z.string(),
  sites: z.record(z.string(), z.string()),
  paths: z.record(z.string(), z.array(z.string())),
});

export const sliceDetailSchema = z.object({
  slice: sliceRowSchema,
  functions: z.array(sliceFunctionViewSchema),
  ties: z.array(sliceTieViewSchema),
  /** every placement revision, newest first */
  history: z.array(placementRevisionSchema),
});

// ---- map -----------------------------------------------------------------------------------------
export const networkMapSchema = z.object({
  name: z.string().nullable(),
  outline: outlineSchema.nullable(),
  sites: z.array(z.object({
    id: z.string(), name: z.string(), kind: z.enum(SITE_KINDS), lat: z.number(), lon: z.number(), cpuUtilisation: ratio,
  })),
  spans: z.array(z.object({
    id: z.string(), a: z.string(), b: z.string(), capacityGbps: z.number(), utilisation: ratio,
  })),
});

export const tenantDetailSchema = z.object({
  tenant: tenantRowSchema,
  contacts: z.array(z.object({ name: z.string(), email: z.string() })),
  slices: z.array(sliceRowSchema),
});
