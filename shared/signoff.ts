// API contract for change-board sign-off (DESIGN §3 "Sign-off"): the approver's queue, the one-screen summary,
// decisions, and one-time-code enrolment.
import { z } from 'zod';
import type { PlanReview } from './plans';
import { touchCountsSchema } from './touch-counts';

export const riskClassSchema = z.enum(['low', 'high']);
export type RiskClass = z.infer<typeof riskClassSchema>;

/**
 * The risk class that picks the quorum: `high` when the plan touches a critical slice, rates any slice's risk
 * high or critical, or leaves any slice unresolved (an accepted outage is still an outage); otherwise `low`.
 */
export function riskClassOf(review: Pick<PlanReview, 'slices' | 'risk'>): RiskClass {
  if (review.slices.some((s) => s.critical || s.outcome === 'unresolved')) return 'high';
  if (review.risk.some((r) => r.severity === 'high' || r.severity === 'critical')) return 'high';
  return 'low';
}

export const SIGNOFF_DECISIONS = ['approve', 'send-back'] as const;
export const signoffDecisionSchema = z.enum(SIGNOFF_DECISIONS);
export type SignoffDecisionKind = z.infer<typeof signoffDecisionSchema>;

/** A 6-digit code from an authenticator app (RFC 6238, 30-second steps). */
export const otpCodeSchema = z.string().trim().regex(/^\d{6}$/, 'The code is the 6 digits your authenticator app shows.');

export const signoffDecisionBodySchema = z.object({
  decision: signoffDecisionSchema,
  comment: z.string().trim().min(1, 'Say why in a comment; the board and the planner read it.').max(4000),
  code: otpCodeSchema.optional(),
}).strict();
export type SignoffDecisionBody = z.infer<typeof signoffDecisionBodySchema>;

const person = z.object({ id: z.string(), name: z.string() });

export const signoffDecisionViewSchema = z.object({
  round: z.number().int(),
  approver: person,
  decision: signoffDecisionSchema,
  comment: z.string().nullable(),
  codeConfirmed: z.boolean(),
  decidedAt: z.string(),
});
export type SignoffDecisionView = z.infer<typeof signoffDecisionViewSchema>;

/** Whether the asking approver may decide now, and why not when they may not. */
export const signoffMySchema = z.object({
  decided: z.boolean(),
  /** `self`: they booked the window or made/accepted its plan; `closed`: not in review; `role`: not an approver */
  blocked: z.enum(['self', 'closed', 'role', 'decided']).nullable(),
});

export const signoffQueueItemSchema = z.object({
  windowId: z.string(),
  title: z.string(),
  startsAt: z.string(),
  endsAt: z.string(),
  workType: z.string().nullable(),
  round: z.number().int(),
  riskClass: riskClassSchema,
  critical: z.boolean(),
  quorum: z.number().int(),
  approvals: z.number().int(),
  me: signoffMySchema,
});
export type SignoffQueueItem = z.infer<typeof signoffQueueItemSchema>;

export const signoffQueueSchema = z.object({ windows: z.array(signoffQueueItemSchema), requireCode: z.boolean() });
export type SignoffQueue = z.infer<typeof signoffQueueSchema>;

export const signoffSummarySchema = z.object({
  window: z.object({
    id: z.string(), title: z.string(), workType: z.string().nullable(), status: z.string(),
    startsAt: z.string(), endsAt: z.string(), round: z.number().int(), owner: person.nullable(),
    elements: z.array(z.object({ kind: z.enum(['site', 'span']), id: z.string(), name: z.string(), effect: z.enum(['down', 'reduced']), fraction: z.number().nullable() })),
  }),
  plan: z.object({ id: z.string(), href: z.string(), acceptedAt: z.string().nullable(), acceptedBy: person.nullable() }),
  /**
   * per tenant, every tenant with a touched slice or a knock-on move: its touched slices (`affected`), how many of
   * them move (function moves or ties rerouted), how many only lose protection, and its slices the window does not
   * touch that are moved to make room (knock-on moves, not counted in affected / moving)
   */
  tenants: z.array(z.object({
    id: z.string(), name: z.string(), affected: z.number().int(), moving: z.number().int(), knockOn: z.number().int().default(0),
    protectionLost: z.number().int().default(0),
  })),
  /** the shared counts (shared/touch-counts.ts), the same the impact screen and the plan review show */
  touch: touchCountsSchema.optional(),
  totals: z.object({
    affected: z.number().int(), moving: z.number().int(), stays: z.number().int(), unresolved: z.number().int(),
    knockOn: z.number().int().default(0),
  }),
  /** knock-on moves: slices the window does not touch, moved or rerouted to make room for affected ones (by name) */
  knockOn: z.array(z.object({
    slice: z.string(), name: z.string(), tenantName: z.string(), outcome: z.enum(['move', 'reroute']), madeRoomFor: z.array(z.string()),
  })).default([]),
  unresolved: z.array(z.object({ slice: z.string(), name: z.string(), tenantName: z.string(), reason: z.string().nullable(), outageAccepted: z.boolean() })),
  riskClass: riskClassSchema,
  /** every slice risk of the plan, worst first (the screen shows the first few and offers the rest) */
  highestRisks: z.array(z.object({
    slice: z.string(), name: z.string(), severity: z.enum(['low', 'medium', 'high', 'critical']),
    failureProbability: z.number(), unprotected: z.boolean(),
  })),
  criticalSlices: z.number().int(),
  mop: z.object({ fileName: z.string(), href: z.string() }).nullable(),
  quorum: z.number().int(),
  approvals: z.number().int(),
  requireCode: z.boolean(),
  /** every decision on this window, newest round first */
  decisions: z.array(signoffDecisionViewSchema),
  me: signoffMySchema,
});
export type SignoffSummary = z.infer<typeof signoffSummarySchema>;

export const signoffDecisionResultSchema = z.object({
  status: z.string(),
  approvals: z.number().int(),
  quorum: z.number().int(),
  /** set when this decision reached the quorum and notices went out */
  notices: z.object({ queued: z.number().int(), blocked: z.number().int() }).nullable(),
});
export type SignoffDecisionResult = z.infer<typeof signoffDecisionResultSchema>;

export const signoffSubmitResultSchema = z.object({
  windowId: z.string(), status: z.string(), round: z.number().int(), approversMailed: z.number().int(),
});
export type SignoffSubmitResult = z.infer<typeof signoffSubmitResultSchema>;

// One-time-code enrolment (RFC 6238).
export const otpStatusSchema = z.object({ enrolled: z.boolean(), confirmedAt: z.string().nullable() });
export type OtpStatus = z.infer<typeof otpStatusSchema>;

export const otpEnrolmentSchema = z.object({
  /** otpauth://totp/… for authenticator apps */
  uri: z.string(),
  /** the shared key as base32 text, for typing in by hand */
  keyBase32: z.string(),
  /** the URI as a QR code, SVG markup */
  qrSvg: z.string(),
});
export type OtpEnrolment = z.infer<typeof otpEnrolmentSchema>;

export const otpConfirmBodySchema = z.object({ code: otpCodeSchema }).strict();
