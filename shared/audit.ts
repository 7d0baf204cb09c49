// Audit trail API contract (admin, approver): every recorded action with who, when, what in words, the window or
// object by name, the changed fields in words and the comment; filtered, paged newest first, or as CSV.
import { z } from 'zod';

export const AUDIT_MAX_PAGE_SIZE = 100;
export const AUDIT_DEFAULT_PAGE_SIZE = 50;

const optionalText = z.string().trim().min(1).max(200).optional();
/** An instant (ISO 8601 with a zone) or a calendar day (YYYY-MM-DD, read as UTC). */
const instant = z.string().trim().refine((v) => !Number.isNaN(Date.parse(v)), { message: 'Give a date, e.g. 2027-01-31.' }).optional();

/** GET /api/audit?window=&person=&action=&from=&to=&page=&pageSize=&format=json|csv — newest first. */
export const auditQuerySchema = z.object({
  window: optionalText,
  /** a user's id (the screen picks people by name) */
  person: optionalText,
  action: optionalText,
  /** from this instant on (inclusive) */
  from: instant,
  /** before this instant (exclusive); a bare day means up to the end of that day */
  to: instant,
  page: z.coerce.number().int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(AUDIT_MAX_PAGE_SIZE).default(AUDIT_DEFAULT_PAGE_SIZE),
  format: z.enum(['json', 'csv']).default('json'),
}).refine((q) => !q.from || !q.to || Date.parse(q.from) <= Date.parse(q.to), { message: 'The start of the date range is after its end.', path: ['to'] });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** The window or object an action was about, by name; `href` is its screen when it has one. */
export const auditSubjectSchema = z.object({
  /** what kind of thing it is, in words ("Window", "Freeze", "Notice") */
  kind: z.string(),
  name: z.string(),
  href: z.string().nullable(),
});
export type AuditSubject = z.infer<typeof auditSubjectSchema>;

export const auditEntrySchema = z.object({
  id: z.string(),
  /** UTC instant (ISO 8601 with Z) */
  at: z.string(),
  /** the person's name; null when the system did it or the person is no longer listed */
  who: z.string().nullable(),
  action: z.string(),
  /** the action in plain words */
  what: z.string(),
  subject: auditSubjectSchema.nullable(),
  /** the changed fields in words ("Status: Draft → Assessed"); never passwords, tokens or codes */
  changes: z.array(z.string()),
  comment: z.string().nullable(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

export const auditPageSchema = z.object({
  items: z.array(auditEntrySchema),
  total: z.number().int().min(0),
  page: z.number().int().min(1),
  pageSize: z.number().int().min(1),
});
export type AuditPage = z.infer<typeof auditPageSchema>;

/** GET /api/audit/choices — what the filters offer: people, windows and actions that appear in the trail. */
export const auditChoicesSchema = z.object({
  people: z.array(z.object({ id: z.string(), name: z.string() })),
  windows: z.array(z.object({ id: z.string(), title: z.string() })),
  actions: z.array(z.object({ code: z.string(), words: z.string() })),
});
export type AuditChoices = z.infer<typeof auditChoicesSchema>;
