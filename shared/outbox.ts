// Outbox API contract (admin): messages the local SMTP sink received, listed and shown parsed.
import { z } from 'zod';

export const OUTBOX_MAX_PAGE_SIZE = 100;
export const OUTBOX_DEFAULT_PAGE_SIZE = 30;

/** GET /api/outbox?page=&pageSize= — newest first. */
export const outboxListQuerySchema = z.object({
  page: z.coerce.number().int().min(1).default(1),
  pageSize: z.coerce.number().int().min(1).max(OUTBOX_MAX_PAGE_SIZE).default(OUTBOX_DEFAULT_PAGE_SIZE),
});
export type OutboxListQuery = z.infer<typeof outboxListQuerySchema>;

/** `:id` of a sink message (a positive integer). */
export const outboxIdParamSchema = z.object({ id: z.coerce.number().int().min(1).max(Number.MAX_SAFE_INTEGER) });

export const outboxSummarySchema = z.object({
  id: z.number().int(),
  receivedAt: z.string(),
  /** SMTP envelope sender (MAIL FROM); null for a bounce-style empty sender */
  from: z.string().nullable(),
  /** SMTP envelope recipients (RCPT TO) */
  to: z.array(z.string()),
  subject: z.string().nullable(),
  sizeBytes: z.number().int().min(0),
  /** the message carries a text/calendar part (an invitation or cancellation) */
  hasCalendar: z.boolean(),
});
export type OutboxSummary = z.infer<typeof outboxSummarySchema>;

export const outboxListSchema = z.object({
  items: z.array(outboxSummarySchema),
  total: z.number().int().min(0),
  page: z.number().int().min(1),
  pageSize: z.number().int().min(1),
});
export type OutboxList = z.infer<typeof outboxListSchema>;

export const outboxAttachmentSchema = z.object({
  filename: z.string().nullable(),
  contentType: z.string(),
  sizeBytes: z.number().int().min(0),
});
export type OutboxAttachment = z.infer<typeof outboxAttachmentSchema>;

/** A date-time property of the event: the value as written, its TZID parameter, and UTC when known. */
export const outboxEventTimeSchema = z.object({
  value: z.string(),
  timeZone: z.string().nullable(),
  /** ISO 8601 in UTC when the value is in UTC (ends in Z); null for floating or zoned times */
  iso: z.string().nullable(),
});
export type OutboxEventTime = z.infer<typeof outboxEventTimeSchema>;

/** The first VEVENT of the invitation, read for people (RFC 5545 property names in comments). */
export const outboxEventSchema = z.object({
  uid: z.string().nullable(), // UID
  summary: z.string().nullable(), // SUMMARY
  start: outboxEventTimeSchema.nullable(), // DTSTART
  end: outboxEventTimeSchema.nullable(), // DTEND
  sequence: z.number().int().nullable(), // SEQUENCE
  status: z.string().nullable(), // STATUS
  location: z.string().nullable(), // LOCATION
  organizer: z.string().nullable(), // ORGANIZER
});
export type OutboxEvent = z.infer<typeof outboxEventSchema>;

/** The iCalendar part (RFC 6047): METHOD from the content type or the calendar, the text, and its event. */
export const outboxCalendarSchema = z.object({
  method: z.string().nullable(),
  text: z.string(),
  event: outboxEventSchema.nullable(),
});
export type OutboxCalendar = z.infer<typeof outboxCalendarSchema>;

/** GET /api/outbox/:id — the message parsed (headers, plain-text body, attachments, calendar). */
export const outboxMessageSchema = z.object({
  id: z.number().int(),
  receivedAt: z.string(),
  sizeBytes: z.number().int().min(0),
  envelope: z.object({ from: z.string().nullable(), to: z.array(z.string()) }),
  /** header fields as written (display names included) */
  from: z.string().nullable(),
  to: z.string().nullable(),
  cc: z.string().nullable(),
  subject: z.string().nullable(),
  /** the Date header, ISO 8601 */
  date: z.string().nullable(),
  messageId: z.string().nullable(),
  text: z.string().nullable(),
  hasHtml: z.boolean(),
  attachments: z.array(outboxAttachmentSchema),
  calendar: outboxCalendarSchema.nullable(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
