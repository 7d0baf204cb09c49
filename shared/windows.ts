// API contract for maintenance windows: booking/editing requests, the window as returned, lifecycle states.
import { z } from 'zod';

export const WINDOW_STATUSES = [
  'draft', 'assessed', 'planned', 'in-review', 'cleared', 'returned',
  'notified', 'underway', 'done', 'rolled-back', 'withdrawn',
] as const;
export const windowStatusSchema = z.enum(WINDOW_STATUSES);
export type WindowStatus = z.infer<typeof windowStatusSchema>;

/** States in which a window still takes its elements out (conflicts and calendars count only these). */
export const ACTIVE_WINDOW_STATUSES: readonly WindowStatus[] = [
  'draft', 'assessed', 'planned', 'in-review', 'cleared', 'returned', 'notified', 'underway',
];

const isoInstant = z.iso.datetime({ offset: true, message: 'must be an ISO 8601 date-time with a time-zone offset' });

export const windowElementSchema = z.object({
  kind: z.enum(['site', 'span']),
  id: z.string().min(1).max(200),
  effect: z.enum(['down', 'reduced']),
  /** for `reduced`: the capacity left, strictly between 0 and 1 */
  fraction: z.number().nullish(),
});
export type WindowElementInput = z.infer<typeof windowElementSchema>;

const windowFields = {
  title: z.string().trim().min(1, 'Give the window a title').max(200),
  startsAt: isoInstant,
  endsAt: isoInstant,
  workType: z.string().trim().max(100).nullish(),
  notes: z.string().max(10_000).nullish(),
  elements: z.array(windowElementSchema).max(500),
  /** admin only: why this window may be booked inside a freeze */
  freezeOverrideReason: z.string().trim().min(1).max(2000).nullish(),
};

export const windowCreateSchema = z.object(windowFields);
export type WindowCreate = z.infer<typeof windowCreateSchema>;

export const windowPatchSchema = z.object({ ...windowFields, version: z.number().int().min(1) })
  .partial().required({ version: true });
export type WindowPatch = z.infer<typeof windowPatchSchema>;

export const windowTransitionSchema = z.object({
  to: windowStatusSchema,
  version: z.number().int().min(1),
  reason: z.string().trim().max(2000).optional(),
});
export type WindowTransition = z.infer<typeof windowTransitionSchema>;

export const windowVersionSchema = z.object({ version: z.number().int().min(1) });

export const mopInfoSchema = z.object({
  fileName: z.string(), mime: z.string(), sizeBytes: z.number().int(), uploadedAt: z.string(),
});

export const windowSchema = z.object({
  id: z.string(),
  title: z.string(),
  /** UTC instants (ISO 8601 with Z) */
  startsAt: z.string(),
  endsAt: z.string(),
  /** from the instants, so a daylight-saving change is counted correctly */
  durationHours: z.number(),
  workType: z.string().nullable(),
  notes: z.string().nullable(),
  status: windowStatusSchema,
  version: z.number().int(),
  owner: z.object({ id: z.string(), name: z.string() }).nullable(),
  elements: z.array(z.object({
    kind: z.enum(['site', 'span']), id: z.string(), effect: z.enum(['down', 'reduced']), fraction: z.number().nullable(),
  })),
  freezeOverrideReason: z.string().nullable(),
  conflictCount: z.number().int(),
  /** from the stored impact; false while none is stored */
  touchesCritical: z.boolean(),
  impactStored: z.boolean(),
  mop: mopInfoSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Window = z.infer<typeof windowSchema>;

export const windowListSchema = z.object({ windows: z.array(windowSchema) });
export type WindowList = z.infer<typeof windowListSchema>;

/** Answer to POST/PATCH/transition: the window, whether an edit sent it back to draft, its conflicts. */
export const windowMutationSchema = z.object({
  window: windowSchema,
  reverted: z.boolean(),
  conflictCount: z.number().int(),
});
export type WindowMutation = z.infer<typeof windowMutationSchema>;

export const windowListQuerySchema = z.object({
  from: isoInstant,
  to: isoInstant,
  mine: z.enum(['true', 'false']).optional(),
  /** one status or several, comma-separated */
  status: z.string().optional(),
  /** a site or span id */
  element: z.string().optional(),
  /** windows affecting this tenant's slices */
  tenant: z.string().optional(),
});
