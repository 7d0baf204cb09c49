// API contract for what a tenant user reads about maintenance: the work on its own slices in the words of its
// notice (no window title, owner, element ids, notes, MOP or freeze-override reason), from the time it was notified.
import { z } from 'zod';
import { overviewSchema } from './api';
import { noticeEffectSchema, noticeSliceSchema } from './notices';

/** Where the work stands, in the tenant's terms (the operator's internal states are not shown). */
export const TENANT_WORK_STAGES = ['planned', 'underway', 'finished', 'cancelled'] as const;
export const tenantWorkStageSchema = z.enum(TENANT_WORK_STAGES);
export type TenantWorkStage = z.infer<typeof tenantWorkStageSchema>;

/** One of the tenant's own slices, by its name, and what the work does to it. */
export const tenantWorkSliceSchema = noticeSliceSchema.omit({ slice: true }).strict();

/** GET /api/windows/:id (and each entry of GET /api/windows) for a tenant user. */
export const tenantWindowViewSchema = z.object({
  windowId: z.string(),
  /** the notice to open for the full text, the invitation and the acknowledgement */
  noticeId: z.string(),
  /** "Planned network maintenance (fibre splice)" */
  summary: z.string(),
  /** UTC instants (ISO 8601) */
  startsAt: z.string(),
  endsAt: z.string(),
  durationHours: z.number(),
  timeZone: z.string(),
  whenLocal: z.string(),
  whenUtc: z.string(),
  stage: tenantWorkStageSchema,
  /** the work touches one of the tenant's critical slices */
  critical: z.boolean(),
  effect: noticeEffectSchema,
  effectText: z.string(),
  afterWork: z.string(),
  slices: z.array(tenantWorkSliceSchema),
  /** why the notice came later than the agreed lead time, when an admin sent it anyway */
  leadOverrideReason: z.string().nullable(),
  acknowledgedAt: z.string().nullable(),
}).strict();
export type TenantWindowView = z.infer<typeof tenantWindowViewSchema>;

export const tenantWindowListSchema = z.object({ windows: z.array(tenantWindowViewSchema) }).strict();
export type TenantWindowList = z.infer<typeof tenantWindowListSchema>;

/** GET /api/overview for a tenant user: its own footprint's figures and the next work it has been told about. */
export const tenantOverviewSchema = overviewSchema.omit({ nextWindows: true }).extend({
  scope: z.literal('tenant'),
  nextWork: z.array(tenantWindowViewSchema),
}).strict();
export type TenantOverview = z.infer<typeof tenantOverviewSchema>;

/** Either answer of GET /api/overview: a tenant user's (tried first: it alone carries `scope`) or staff's. */
export const anyOverviewSchema = z.union([tenantOverviewSchema, overviewSchema]);
export type AnyOverview = z.infer<typeof anyOverviewSchema>;

export const isTenantOverview = (o: AnyOverview): o is TenantOverview => 'scope' in o && o.scope === 'tenant';
