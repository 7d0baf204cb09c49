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
