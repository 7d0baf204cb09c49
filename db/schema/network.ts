// Physical network (sites, spans), tenants, slices with their functions and ties, and placement revisions.
import {
  pgTable, text, doublePrecision, integer, boolean, jsonb, timestamp, primaryKey, index, uniqueIndex,
} from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';

export const tenants = pgTable('tenants', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  noticeDays: integer('notice_days').notNull(),
  contacts: jsonb('contacts').$type<{ name: string; email: string }[]>().notNull().default([]),
});

export const sites = pgTable('sites', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  kind: text('kind', { enum: ['core', 'aggregation', 'edge', 'cell-site'] }).notNull(),
  lat: doublePrecision('lat').notNull(),
  lon: doublePrecision('lon').notNull(),
  cpu: doublePrecision('cpu').notNull(),
  mtbfHours: doublePrecision('mtbf_hours'),
  mttrHours: doublePrecision('mttr_hours'),
});

export const spans = pgTable(
  'spans',
  {
    id: text('id').primaryKey(),
    siteA: text('site_a').notNull().references(() => sites.id, { onDelete: 'restrict' }),
    siteB: text('site_b').notNull().references(() => sites.id, { onDelete: 'restrict' }),
    capacityGbps: doublePrecision('capacity_gbps').notNull(),
    lengthKm: doublePrecision('length_km').notNull(),
    /** null = derived from length at the fibre planning value */
    latencyMs: doublePrecision('latency_ms'),
    mtbfHours: doublePrecision('mtbf_hours'),
    mttrHours: doublePrecision('mttr_hours'),
    srlg: text('srlg').array().notNull().default(sql`'{}'::text[]`),
  },
  (t) => [index('spans_site_a_idx').on(t.siteA), index('spans_site_b_idx').on(t.siteB)],
);

export const slices = pgTable(
  'slices',
  {
    id: text('id').primaryKey(),
    tenantId: text('tenant_id').notNull().references(() => tenants.id, { onDelete: 'restrict' }),
    name: text('name').notNull(),
    sst: integer('sst').notNull(),
    /** 6 hex digits, null = no SD (FFFFFF on the wire) */
    sd: text('sd'),
    priority: integer('priority').notNull(),
    critical: boolean('critical').notNull().default(false),
    status: text('status').notNull().default('active'),
  },
  (t) => [index('slices_tenant_idx').on(t.tenantId)],
);

export const sliceFunctions = pgTable(
  'slice_functions',
  {
    id: text('id').primaryKey(),
    sliceId: text('slice_id').notNull().references(() => slices.id, { onDelete: 'cascade' }),
    name: text('name'),
    cpu: doublePrecision('cpu').notNull(),
    /** { site } or { lat, lon, radiusKm } */
    anchor: jsonb('anchor').$type<{ site: string } | { lat: number; lon: number; radiusKm: number }>(),
    moveCost: doublePrecision('move_cost').notNull().default(1),
    fixed: boolean('fixed').notNull().default(false),
  },
  (t) => [index('slice_functions_slice_idx').on(t.sliceId)],
);

export const sliceTies = pgTable(
  'slice_ties',
  {
    id: text('id').primaryKey(),
    sliceId: text('slice_id').notNull().references(() => slices.id, { onDelete: 'cascade' }),
    fromFunction: text('from_function').notNull().references(() => sliceFunctions.id, { onDelete: 'cascade' }),
    toFunction: text('to_function').notNull().references(() => sliceFunctions.id, { onDelete: 'cascade' }),
    bandwidthGbps: doublePrecision('bandwidth_gbps').notNull(),
    maxLatencyMs: doublePrecision('max_latency_ms').notNull(),
    minAvailability: doublePrecision('min_availability'),
  },
  (t) => [index('slice_ties_slice_idx').on(t.sliceId)],
);

/**
 * Placement revisions: every accepted change to where a slice lives adds a row with the next
 * revision number; `current` marks the one in force (at most one per slice, enforced by a partial
 * unique index), so "the current placement" is a single indexed lookup.
 */
export const placements = pgTable(
  'placements',
  {
    sliceId: text('slice_id').notNull().references(() => slices.id, { onDelete: 'cascade' }),
    revision: integer('revision').notNull(),
    current: boolean('current').notNull().default(true),
    /** function id → site id */
    sites: jsonb('sites').$type<Record<string, string>>().notNull(),
    /** tie id → ordered span ids */
    paths: jsonb('paths').$type<Record<string, string[]>>().notNull(),
    reason: text('reason').notNull().default('import'),
    createdBy: text('created_by'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ columns: [t.sliceId, t.revision] }),
    uniqueIndex('placements_one_current_key').on(t.sliceId).where(sql`${t.current}`),
  ],
);

/** One row (id 'network'): the network's name and map outline (GeoJSON Polygon/MultiPolygon). */
export const networkMeta = pgTable('network_meta', {
  id: text('id').primaryKey(),
  name: text('name'),
  outline: jsonb('outline'),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});
