// Admin-set policies with their defaults (GET /api/policies for staff, PATCH for admins).
import { z } from 'zod';

export const policiesSchema = z.object({
  /** the longest a maintenance window may last, in hours of real (UTC) time */
  maxWindowHours: z.number().positive().max(24 * 14),
  /** how far in the past a window may start and still be booked (clocks differ a little) */
  bookingSkewMinutes: z.number().int().min(0).max(120),
  /** tenants are told at least this many days ahead unless their contract says more */
  noticeLeadDays: z.number().int().min(0).max(90),
});
export type Policies = z.infer<typeof policiesSchema>;

export const POLICY_DEFAULTS: Policies = { maxWindowHours: 12, bookingSkewMinutes: 5, noticeLeadDays: 7 };

export const policiesPatchSchema = policiesSchema.partial().strict();
export type PoliciesPatch = z.infer<typeof policiesPatchSchema>;

export const policiesResponseSchema = z.object({ policies: policiesSchema });
