// A stored sink message parsed for the Outbox with mailparser: headers, text body, attachments, invitation.
import { simpleParser, type AddressObject, type Attachment, type HeaderValue } from 'mailparser';
import type { OutboxAttachment, OutboxCalendar, OutboxMessage } from '../../shared/outbox';
import { calendarMethod, firstEvent, parseCalendar } from './ics-event';

export type ParsedMail = Omit<OutboxMessage, 'id' | 'receivedAt' | 'sizeBytes' | 'envelope'>;

const addressText = (value: AddressObject | AddressObject[] | undefined): string | null => {
  if (!value) return null;
  return (Array.isArray(value) ? value : [value]).map((a) => a.text).join(', ') || null;
};

/** The content-type header's `method` parameter (RFC 6047 §2.4), if any. */
function methodParam(attachment: Attachment): string | null {
  const header = attachment.headers.get('content-type') as HeaderValue | undefined;
  if (header && typeof header === 'object' && 'params' in header) {
    const method = (header.params as Record<string, string>).method;
    if (method) return method.toUpperCase();
  }
  return null;
}

const isCalendar = (a: Attachment) => a.contentType.toLowerCase() === 'text/calendar';

/** The text/calendar part, preferred over an .ics attachment (they hold the same calendar when both exist). */
function calendarOf(attachments: Attachment[]): OutboxCalendar | null {
  const part = attachments.find(isCalendar)
    ?? attachments.find((a) => a.contentType.toLowerCase() === 'application/ics' || /\.ics$/i.test(a.filename ?? ''));
  if (!part) return null;
  const text = part.content.toString('utf8');
  const calendar = parseCalendar(text);
  return {
    method: methodParam(part) ?? (calendar && calendarMethod(calendar)),
    text,
    event: calendar && firstEvent(calendar),
  };
}

export async function parseSinkMessage(raw: string): Promise<ParsedMail> {
  const mail = await simpleParser(raw, { skipImageLinks: true, skipTextToHtml: true });
  // The text/calendar alternative is a body part, not something the sender attached: list the rest.
  const attachments: OutboxAttachment[] = mail.attachments
    .filter((a) => !isCalendar(a))
    .map((a) => ({ filename: a.filename ?? null, contentType: a.contentType, sizeBytes: a.size }));
  return {
    from: addressText(mail.from),
    to: addressText(mail.to),
    cc: addressText(mail.cc),
    subject: mail.subject ?? null,
    date: mail.date ? mail.date.toISOString() : null,
    messageId: mail.messageId ?? null,
    text: mail.text ?? null,
    hasHtml: typeof mail.html === 'string' && mail.html.length > 0,
    attachments,
    calendar: calendarOf(mail.attachments),
  };
}
