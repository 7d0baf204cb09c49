// The `slackwater-scenario/1` file format: the one contract for imports, the demo, tests and the planner CLI.
import { z } from 'zod';
import { BAD_TEXT_MESSAGE, badTextReason, safeText } from './safe-text';

export const SCENARIO_FORMAT = 'slackwater-scenario/1';

/** Fibre planning value: 5 µs/km one way (ITU-T G.114 Table A.1, provisional there). */
export const FIBRE_MS_PER_KM = 0.005;

const id = safeText().min(1, 'must be a non-empty id');
/** A record whose keys are checked as a whole: a zod key issue would put the bad key itself into the path. */
const safeKeys = <T extends z.ZodType>(value: T) => z.record(z.string(), value)
  .refine((r) => Object.keys(r).every((k) => badTextReason(k) === null), `keys ${BAD_TEXT_MESSAGE}`);
const finite = z.number().refine(Number.isFinite, 'must be a finite number');
const positive = finite.refine((n) => n > 0, 'must be greater than 0');
const latitude = finite.refine((n) => n >= -90 && n <= 90, 'latitude must be within −90…90');
const longitude = finite.refine((n) => n >= -180 && n <= 180, 'longitude must be within −180…180');
const hours = positive.optional();

const position = z.array(finite).min(2);
const ring = z.array(position).min(4, 'a linear ring needs at least 4 positions');
export const outlineSchema = z.union([
  z.object({ type: z.literal('Polygon'), coordinates: z.array(ring).min(1) }),
  z.object({ type: z.literal('MultiPolygon'), coordinates: z.array(z.array(ring).min(1)).min(1) }),
]);

export const SITE_KINDS = ['core', 'aggregation', 'edge', 'cell-site'] as const;
export const siteSchema = z.object({
  id,
  name: safeText().min(1),
  kind: z.enum(SITE_KINDS),
  lat: latitude,
  lon: longitude,
  cpu: positive,
  mtbfHours: hours,
  mttrHours: hours,
});

export const spanSchema = z.object({
  id,
  a: id,
  b: id,
  capacityGbps: positive,
  lengthKm: positive,
  latencyMs: positive.optional(),
  mtbfHours: hours,
  mttrHours: hours,
  srlg: z.array(safeText().min(1)).optional(),
});

export const tenantSchema = z.object({
  id,
  name: safeText().min(1),
  noticeDays: z.number().int('must be a whole number of days').min(0),
  contacts: z.array(z.object({ name: safeText().min(1), email: z.email() })).optional(),
});

export const anchorSchema = z.union([
  z.object({ site: id }),
  z.object({ lat: latitude, lon: longitude, radiusKm: positive }),
]);

export const functionSchema = z.object({
  id,
  name: safeText().optional(),
  cpu: positive,
  anchor: anchorSchema.optional(),
  moveCost: finite.refine((n) => n >= 0, 'must be ≥ 0').optional(),
  fixed: z.boolean().optional(),
});

export const tieSchema = z.object({
  id,
  from: id,
  to: id,
  bandwidthGbps: positive,
  maxLatencyMs: positive,
  minAvailability: finite.refine((n) => n > 0 && n <= 1, 'must be within (0, 1]').optional(),
});

export const sliceSchema = z.object({
  id,
  tenant: id,
  name: safeText().min(1),
  sst: z.number().int().min(1).max(255),
  sd: z.string().regex(/^[0-9A-Fa-f]{6}$/, 'SD must be 6 hex digits').optional(),
  priority: z.number().int().min(1).max(5),
  critical: z.boolean().optional(),
  functions: z.array(functionSchema).min(1, 'a slice needs at least one function'),
  ties: z.array(tieSchema),
});

export const placementSchema = z.object({
  slice: id,
  sites: safeKeys(id),
  paths: safeKeys(z.array(id)),
});

const isoWithOffset = z.iso.datetime({ offset: true, message: 'must be ISO 8601 with a time-zone offset' });
export const reducedSchema = z.union([
  z.object({ site: id, fraction: finite.refine((f) => f > 0 && f < 1, 'fraction must be within (0, 1)') }),
  z.object({ span: id, fraction: finite.refine((f) => f > 0 && f < 1, 'fraction must be within (0, 1)') }),
]);
export const scenarioWindowSchema = z.object({
  id,
  title: safeText().min(1),
  start: isoWithOffset,
  end: isoWithOffset,
  down: z.object({ sites: z.array(id), spans: z.array(id) }),
  reduced: z.array(reducedSchema).optional(),
  workType: safeText().optional(),
});

export const scenarioSchema = z.object({
  format: z.literal(SCENARIO_FORMAT),
  name: safeText().optional(),
  outline: outlineSchema.optional(),
  sites: z.array(siteSchema),
  spans: z.array(spanSchema),
  tenants: z.array(tenantSchema),
  slices: z.array(sliceSchema),
  placements: z.array(placementSchema),
  windows: z.array(scenarioWindowSchema).optional(),
});

export type Scenario = z.infer<typeof scenarioSchema>;
export type ScenarioSite = z.infer<typeof siteSchema>;
export type ScenarioSpan = z.infer<typeof spanSchema>;
export type ScenarioTenant = z.infer<typeof tenantSchema>;
export type ScenarioSlice = z.infer<typeof sliceSchema>;
export type ScenarioFunction = z.infer<typeof functionSchema>;
export type ScenarioTie = z.infer<typeof tieSchema>;
export type ScenarioPlacement = z.infer<typeof placementSchema>;
export type ScenarioWindow = z.infer<typeof scenarioWindowSchema>;
export type Anchor = z.infer<typeof anchorSchema>;

/** Span latency as the format defines it: given, or length × fibre planning value. */
export function spanLatencyMs(span: Pick<ScenarioSpan, 'latencyMs' | 'lengthKm'>): number {
  return span.latencyMs ?? span.lengthKm * FIBRE_MS_PER_KM;
}

/** Availability A = MTBF / (MTBF + MTTR) (ITU-T E.800 defines availability); 1 when not given. */
export function elementAvailability(e: { mtbfHours?: number; mttrHours?: number }): number {
  if (e.mtbfHours === undefined || e.mttrHours === undefined) return 1;
  return e.mtbfHours / (e.mtbfHours + e.mttrHours);
}
