// API contract for a window's stored impact (GET /api/windows/:id/impact) and its conflicts (…/conflicts).
import { z } from 'zod';

export const IMPACT_REASONS = ['hosted', 'transit', 'squeezed', 'unprotected'] as const;
export const SEVERITIES = ['low', 'medium', 'high', 'critical'] as const;

export const affectedSliceSchema = z.object({
  slice: z.string(),
  name: z.string(),
  tenant: z.object({ id: z.string(), name: z.string() }),
  sst: z.number().int(),
  priority: z.number().int(),
  critical: z.boolean(),
  reasons: z.array(z.enum(IMPACT_REASONS)),
  severity: z.enum(SEVERITIES),
  /** chance that an element the slice still uses (where it sits today) fails during the window */
  failureProbability: z.number(),
  /** left without its disjoint backup during the window */
  unprotected: z.boolean(),
});
export type AffectedSlice = z.infer<typeof affectedSliceSchema>;

export const slicePathSchema = z.object({
  slice: z.string(),
  /** function id → site id */
  sites: z.record(z.string(), z.string()),
  /** tie id → ordered span ids */
  paths: z.record(z.string(), z.array(z.string())),
});

export const windowImpactSchema = z.object({
  windowId: z.string(),
  /** the window version the impact was computed for */
  windowVersion: z.number().int(),
  computedAt: z.string(),
  affected: z.array(affectedSliceSchema),
  touchesCritical: z.boolean(),
  splits: z.boolean(),
  components: z.number().int(),
  overloaded: z.array(z.object({ span: z.string(), loadGbps: z.number(), capacityGbps: z.number() })),
  elements: z.array(z.object({
    kind: z.enum(['site', 'span']), id: z.string(), effect: z.enum(['down', 'reduced']), fraction: z.number().nullable(),
  })),
  /** current placements of the affected slices, for the map */
  currentPaths: z.array(slicePathSchema),
});
export type WindowImpact = z.infer<typeof windowImpactSchema>;

export const CONFLICT_REASONS = ['shared-element', 'joint-split', 'strands-slice'] as const;
export type ConflictReason = (typeof CONFLICT_REASONS)[number];

export const windowConflictSchema = z.object({
  /** the other window */
  window: z.object({ id: z.string(), title: z.string(), startsAt: z.string(), endsAt: z.string(), status: z.string() }),
  reasons: z.array(z.object({
    reason: z.enum(CONFLICT_REASONS),
    message: z.string(),
    /** the shared elements ("site:x", "span:y") or the stranded slices */
    ids: z.array(z.string()),
  })),
});
export type WindowConflict = z.infer<typeof windowConflictSchema>;

export const windowConflictsSchema = z.object({ windowId: z.string(), conflicts: z.array(windowConflictSchema) });
export type WindowConflicts = z.infer<typeof windowConflictsSchema>;
