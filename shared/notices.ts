// API contract for tenant notices (DESIGN §3 "Notice"): what a tenant is told about a window, its sending
// state, and the tenant portal's list of upcoming work.
import { z } from 'zod';

export const NOTICE_STATUSES = ['blocked', 'queued', 'sent', 'failed'] as const;
export const noticeStatusSchema = z.enum(NOTICE_STATUSES);
export type NoticeStatus = z.infer<typeof noticeStatusSchema>;

export const noticeMethodSchema = z.enum(['REQUEST', 'CANCEL']);
export type NoticeMethod = z.infer<typeof noticeMethodSchema>;

/** hitless = make-before-break, no interruption; interruption = an outage the operator accepted; none = no change */
export const noticeEffectSchema = z.enum(['none', 'hitless', 'interruption']);
export type NoticeEffect = z.infer<typeof noticeEffectSchema>;

/** One of the tenant's slices in a notice, in tenant-facing words (no internal site or span names). */
export const noticeSliceSchema = z.object({
  slice: z.string(),
  name: z.string(),
  critical: z.boolean(),
  outcome: z.enum(['stays', 'reroute', 'move', 'unresolved']),
  /** what moves where, one sentence each */
  changes: z.array(z.string()),
  effect: noticeEffectSchema,
  effectText: z.string(),
});
export type NoticeSlice = z.infer<typeof noticeSliceSchema>;

const iso = z.string();

/** Everything a notice says; the e-mail text and the invitation are rendered from it. */
export const noticeContentSchema = z.object({
  windowId: z.string(),
  tenantId: z.string(),
  tenantName: z.string(),
  /** e.g. "Planned network maintenance (fibre splice)" — the window's title names internal places, so it is not used */
  summary: z.string(),
  startsAt: iso,
  endsAt: iso,
  timeZone: z.string(),
  /** "Thu 3 Dec 2026, 22:00 – Fri 4 Dec 2026, 02:00 GMT-1" */
  whenLocal: z.string(),
  whenUtc: z.string(),
  slices: z.array(noticeSliceSchema),
  /** the strongest effect over the slices */
  effect: noticeEffectSchema,
  effectText: z.string(),
  afterWork: z.string(),
  contact: z.object({ name: z.string(), email: z.string() }),
  /** lead time owed in days (the tenant's contract, at least the policy's floor) */
  leadDays: z.number().int(),
  /** set when an admin sent the notice later than the lead time; shown to the tenant */
  leadOverrideReason: z.string().nullable(),
  /** the work was withdrawn (the invitation was cancelled) */
  cancelled: z.boolean(),
});
export type NoticeContent = z.infer<typeof noticeContentSchema>;

/** A notice as its tenant (or staff) reads it. */
export const noticeSchema = z.object({
  id: z.string(),
  windowId: z.string(),
  tenantId: z.string(),
  status: noticeStatusSchema,
  method: noticeMethodSchema,
  sequence: z.number().int(),
  subject: z.string(),
  content: noticeContentSchema,
  sentAt: iso.nullable(),
  acknowledgedAt: iso.nullable(),
  acknowledgedByName: z.string().nullable(),
  updatedAt: iso,
});
export type Notice = z.infer<typeof noticeSchema>;
export const noticeResponseSchema = z.object({ notice: noticeSchema });

/** Staff view of one tenant's notice for a window: sending state and failures. */
export const noticeStatusRowSchema = z.object({
  id: z.string(),
  tenantId: z.string(),
  tenantName: z.string(),
  status: noticeStatusSchema,
  method: noticeMethodSchema,
  sequence: z.number().int(),
  recipients: z.array(z.string()),
  attempts: z.number().int(),
  lastError: z.string().nullable(),
  sentAt: iso.nullable(),
  acknowledgedAt: iso.nullable(),
  leadDays: z.number().int(),
  leadOverrideReason: z.string().nullable(),
  updatedAt: iso,
});
export type NoticeStatusRow = z.infer<typeof noticeStatusRowSchema>;
export const windowNoticesSchema = z.object({ windowId: z.string(), notices: z.array(noticeStatusRowSchema) });
export type WindowNotices = z.infer<typeof windowNoticesSchema>;

/** One upcoming window in the tenant portal; `notice` is null until the tenant has been sent one. */
export const portalWorkItemSchema = z.object({
  windowId: z.string(),
  summary: z.string(),
  startsAt: iso,
  endsAt: iso,
  /** the work touches one of the tenant's critical slices */
  critical: z.boolean(),
  notice: noticeSchema.nullable(),
});
export type PortalWorkItem = z.infer<typeof portalWorkItemSchema>;
/** `timeZone`: the viewer's own zone (their choice, else the network's), the zone the portal lists times in. */
export const portalWorkSchema = z.object({ timeZone: z.string(), items: z.array(portalWorkItemSchema) });
export type PortalWork = z.infer<typeof portalWorkSchema>;

/** POST /api/notices/:id/override (admin): send a late notice anyway, with the reason the tenant will read. */
export const noticeOverrideSchema = z.object({
  reason: z.string().trim().min(5, 'Give a reason of at least 5 characters').max(500),
}).strict();
export type NoticeOverride = z.infer<typeof noticeOverrideSchema>;
