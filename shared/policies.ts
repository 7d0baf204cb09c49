// Admin-set policies with their defaults (GET /api/policies for staff, PATCH for admins).
import { z } from 'zod';

export const policiesSchema = z.object({
  /** the longest a maintenance window may last, in hours of real (UTC) time */
  maxWindowHours: z.number().positive().max(24 * 14),
  /** how far in the past a window may start and still be booked (clocks differ a little) */
  bookingSkewMinutes: z.number().int().min(0).max(120),
  /** tenants are told at least this many days ahead unless their contract says more */
  noticeLeadDays: z.number().int().min(0).max(90),
  /** approvals a window needs when its accepted plan is low risk (shared/signoff.ts riskClassOf) */
  signoffQuorumLow: z.number().int().min(1).max(9),
  /** approvals a window needs when its plan touches a critical slice, has a high/critical risk or leaves a slice unresolved */
  signoffQuorumHigh: z.number().int().min(1).max(9),
  /** approvers confirm every decision with a time-based one-time code (RFC 6238) */
  signoffRequireCode: z.boolean(),
});
export type Policies = z.infer<typeof policiesSchema>;

export const POLICY_DEFAULTS: Policies = {
  maxWindowHours: 12, bookingSkewMinutes: 5, noticeLeadDays: 7,
  signoffQuorumLow: 1, signoffQuorumHigh: 2, signoffRequireCode: false,
};

export const policiesPatchSchema = policiesSchema.partial().strict();
export type PoliciesPatch = z.infer<typeof policiesPatchSchema>;

export const policiesResponseSchema = z.object({ policies: policiesSchema });
