// Imports API contract: kinds, the preview (adds / changes / removes per entity, errors, warnings) and import records.
import { z } from 'zod';

export const IMPORT_KIND_NAMES = ['scenario', 'graphml', 'csv-sites', 'csv-spans', 'csv-slices'] as const;
export const importKindSchema = z.enum(IMPORT_KIND_NAMES);
export type ImportKind = z.infer<typeof importKindSchema>;

export const IMPORT_STATUS_NAMES = ['previewed', 'applied', 'failed', 'superseded'] as const;
export const importStatusSchema = z.enum(IMPORT_STATUS_NAMES);
export type ImportStatus = z.infer<typeof importStatusSchema>;

/** CSV kinds whose template can be downloaded from GET /api/imports/templates/:kind. */
export const CSV_TEMPLATE_KINDS = ['csv-sites', 'csv-spans', 'csv-slices'] as const;

/** Entity types a preview reports on; `network` is the network's name and map outline. */
export const IMPORT_ENTITY_NAMES = ['sites', 'spans', 'tenants', 'slices', 'placements', 'network'] as const;
export type ImportEntity = (typeof IMPORT_ENTITY_NAMES)[number];

/**
 * One problem in an upload. `row` (1 = the header line) for CSV files, `path` for the rest: a JSON path
 * such as `$.slices[3].ties[0].to` for scenario files and for checks of the merged result, or a GraphML
 * element id such as `node[n4]` / `edge[e7]`.
 */
export const importIssueSchema = z.object({
  file: z.string(),
  row: z.number().int().optional(),
  path: z.string().optional(),
  message: z.string(),
});
export type ImportIssue = z.infer<typeof importIssueSchema>;

/** One changed field: dotted path inside the entity (e.g. `functions[f1].cpu`), value before → after (null = none). */
export const fieldChangeSchema = z.object({ field: z.string(), before: z.unknown(), after: z.unknown() });
export type FieldChange = z.infer<typeof fieldChangeSchema>;

export const entityChangeSchema = z.object({ id: z.string(), fields: z.array(fieldChangeSchema) });
export type EntityChange = z.infer<typeof entityChangeSchema>;

const perEntity = <T extends z.ZodType>(item: T) => z.object({
  sites: z.array(item), spans: z.array(item), tenants: z.array(item),
  slices: z.array(item), placements: z.array(item), network: z.array(item),
});

export const importCountsSchema = z.object({
  adds: z.number().int(),
  changes: z.number().int(),
  removes: z.number().int(),
  errors: z.number().int(),
  warnings: z.number().int(),
});
export type ImportCounts = z.infer<typeof importCountsSchema>;

/** Where a value of an imported site or span came from: the file, a default of the upload, or a derivation. */
export const VALUE_SOURCE_NAMES = ['file', 'default', 'derived'] as const;
export const valueSourceSchema = z.enum(VALUE_SOURCE_NAMES);
export type ValueSource = z.infer<typeof valueSourceSchema>;

/** Our site and span fields a GraphML attribute can be mapped to (the `mapping` field of POST /api/imports). */
export const MAPPABLE_SITE_FIELDS = ['name', 'kind', 'lat', 'lon', 'cpu', 'mtbfHours', 'mttrHours'] as const;
export const MAPPABLE_SPAN_FIELDS = ['capacityGbps', 'lengthKm', 'latencyMs', 'mtbfHours', 'mttrHours', 'srlg'] as const;
export type MappableSiteField = (typeof MAPPABLE_SITE_FIELDS)[number];
export type MappableSpanField = (typeof MAPPABLE_SPAN_FIELDS)[number];

/** Site kinds a `siteKind` default may name; `by-degree` ranks the file's sites by their number of spans. */
export const DEFAULT_SITE_KIND_NAMES = ['by-degree', 'core', 'aggregation', 'edge'] as const;
/** Fibre routes run longer than the straight line between their ends; 1.3 is common planning practice. */
export const DEFAULT_ROUTE_FACTOR = 1.3;
export const ROUTE_FACTOR_MIN = 1;
export const ROUTE_FACTOR_MAX = 3;

const positiveNumber = z.number().refine(Number.isFinite, 'must be a finite number').refine((n) => n > 0, 'must be greater than 0');

/**
 * The `defaults` field of POST /api/imports (JSON text): what fills the values a GraphML file lacks. Every key is
 * optional; `routeFactor` becomes 1.3 when defaults are sent at all. cpu in vCPU, capacity in Gbit/s.
 */
export const importDefaultsSchema = z.strictObject({
  siteKind: z.enum(DEFAULT_SITE_KIND_NAMES).optional(),
  cpuByKind: z.strictObject({
    core: positiveNumber.optional(), aggregation: positiveNumber.optional(), edge: positiveNumber.optional(), 'cell-site': positiveNumber.optional(),
  }).optional(),
  spanCapacityGbps: positiveNumber.optional(),
  routeFactor: z.number().refine(Number.isFinite, 'must be a finite number')
    .refine((n) => n >= ROUTE_FACTOR_MIN && n <= ROUTE_FACTOR_MAX, `must be within ${ROUTE_FACTOR_MIN}…${ROUTE_FACTOR_MAX}`)
    .default(DEFAULT_ROUTE_FACTOR),
});
/** What the client sends (every key optional). */
export type ImportDefaultsInput = z.input<typeof importDefaultsSchema>;
/** The defaults as applied (route factor filled in). */
export type ImportDefaults = z.output<typeof importDefaultsSchema>;

/** The `mapping` field of POST /api/imports (JSON text): our field → the file's attribute name, per entity. */
export const importMappingSchema = z.strictObject({
  site: z.partialRecord(z.enum(MAPPABLE_SITE_FIELDS), z.string().min(1)).optional(),
  span: z.partialRecord(z.enum(MAPPABLE_SPAN_FIELDS), z.string().min(1)).optional(),
});
export type ImportMapping = z.infer<typeof importMappingSchema>;

const sourceCountsShape = { file: z.number().int(), default: z.number().int(), derived: z.number().int() };
const valuesById = z.record(z.string(), z.record(z.string(), valueSourceSchema));
const optionalNumber = z.number().nullable().optional();

/** The values of the file's sites and spans after defaults and derivations, so a person can read them by name. */
export const importSourceItemsSchema = z.object({
  sites: z.array(z.object({
    id: z.string(), name: z.string().nullable(), kind: z.string().nullable(), cpu: optionalNumber, lat: optionalNumber, lon: optionalNumber,
  })),
  spans: z.array(z.object({
    id: z.string(), a: z.string(), b: z.string(), aName: z.string().nullable(), bName: z.string().nullable(),
    capacityGbps: optionalNumber, lengthKm: optionalNumber, latencyMs: optionalNumber,
  })),
});
export type ImportSourceItems = z.infer<typeof importSourceItemsSchema>;

/**
 * Where the values of a GraphML import came from. `counts` and `fields` count the values of the sites and spans
 * the import adds or changes; `values` covers every site and span of the file. Values kept from the current
 * inventory (a known site's kind when the file has none) are not listed: the import does not set them.
 */
export const importSourcesSchema = z.object({
  counts: z.object(sourceCountsShape),
  fields: z.array(z.object({ entity: z.enum(['sites', 'spans']), field: z.string(), ...sourceCountsShape })),
  values: z.object({ sites: valuesById, spans: valuesById }),
  /** attribute names found on the file's nodes and edges, for the mapping step */
  attributes: z.object({ site: z.array(z.string()), span: z.array(z.string()) }),
  /** our field → the file attribute it was read from */
  recognised: z.object({ site: z.record(z.string(), z.string()), span: z.record(z.string(), z.string()) }),
  defaults: importDefaultsSchema.optional(),
  items: importSourceItemsSchema.optional(),
});
export type ImportSources = z.infer<typeof importSourcesSchema>;

export const importPreviewSchema = z.object({
  /** ids added, per entity */
  adds: perEntity(z.string()),
  /** ids changed with their changed fields, per entity */
  changes: perEntity(entityChangeSchema),
  /** ids removed, per entity */
  removes: perEntity(z.string()),
  errors: z.array(importIssueSchema),
  warnings: z.array(importIssueSchema),
  counts: importCountsSchema,
  /** GraphML imports: where each value came from, and the file's attribute names */
  sources: importSourcesSchema.optional(),
});
export type ImportPreview = z.infer<typeof importPreviewSchema>;

/** One entity kind's difference between the current state and an import's target, by id. */
export type EntityDiff = { adds: string[]; changes: EntityChange[]; removes: string[] };
/** The whole difference an import would write, per entity kind. */
export type ScenarioDiff = Record<keyof ImportPreview['adds'], EntityDiff>;

/** 201 answer of POST /api/imports. */
export const importCreatedSchema = z.object({
  id: z.string(),
  kind: importKindSchema,
  fileName: z.string(),
  preview: importPreviewSchema,
});
export type ImportCreated = z.infer<typeof importCreatedSchema>;

export const importSummarySchema = z.object({
  id: z.string(),
  kind: importKindSchema,
  fileName: z.string(),
  sizeBytes: z.number().int(),
  status: importStatusSchema,
  errorCount: z.number().int(),
  counts: importCountsSchema,
  failureReason: z.string().nullable(),
  createdBy: z.string().nullable(),
  createdAt: z.string(),
  appliedBy: z.string().nullable(),
  appliedAt: z.string().nullable(),
});
export type ImportSummary = z.infer<typeof importSummarySchema>;

/** GET /api/imports: newest first. */
export const importListSchema = z.object({ imports: z.array(importSummarySchema) });
export type ImportList = z.infer<typeof importListSchema>;

/** GET /api/imports/:id */
export const importDetailSchema = importSummarySchema.extend({ preview: importPreviewSchema });
export type ImportDetail = z.infer<typeof importDetailSchema>;

/** POST /api/imports/:id/apply */
export const importAppliedSchema = z.object({
  id: z.string(),
  status: z.literal('applied'),
  counts: importCountsSchema,
  appliedAt: z.string(),
});
export type ImportApplied = z.infer<typeof importAppliedSchema>;

export const importListQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});
