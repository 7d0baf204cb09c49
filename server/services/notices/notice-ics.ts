// The iCalendar invitation of a notice: METHOD:REQUEST for the invitation and its updates, METHOD:CANCEL with
// STATUS:CANCELLED on withdrawal; one UID per window and tenant, SEQUENCE raised on every change.
// Reference: RFC 5545 §3.6.1, §3.8.4.7, §3.8.7.4; RFC 5546 §3.2.2 (REQUEST), §3.2.5 (CANCEL).
import ical, { ICalAttendeeRole, ICalCalendarMethod, ICalEventStatus } from 'ical-generator';

export type IcsInput = {
  uid: string;
  sequence: number;
  method: 'REQUEST' | 'CANCEL';
  stamp: Date;
  startsAt: Date;
  endsAt: Date;
  summary: string;
  description: string;
  organizer: { name: string; email: string };
  attendees: string[];
  url: string;
};

export const ICS_PROD_ID = { company: 'Slackwater', product: 'Tenant notices', language: 'EN' };

/** "Name <addr@host>" or a bare address → { name, email }. */
export function parseMailbox(value: string): { name: string; email: string } {
  const m = /^\s*(.*?)\s*<([^>]+)>\s*$/.exec(value);
  if (m) return { name: m[1].replace(/^"|"$/g, '') || m[2], email: m[2] };
  return { name: value.trim(), email: value.trim() };
}

export function buildNoticeIcs(input: IcsInput): string {
  const cancel = input.method === 'CANCEL';
  const calendar = ical({
    prodId: ICS_PROD_ID,
    method: cancel ? ICalCalendarMethod.CANCEL : ICalCalendarMethod.REQUEST,
  });
  calendar.createEvent({
    id: input.uid,
    sequence: input.sequence,
    stamp: input.stamp,
    start: input.startsAt,
    end: input.endsAt,
    summary: cancel ? `Cancelled: ${input.summary}` : input.summary,
    description: input.description,
    organizer: input.organizer,
    // Tenants are told, not asked: no reply is expected, so RSVP stays off.
    attendees: input.attendees.map((email) => ({ email, role: ICalAttendeeRole.OPT, rsvp: false })),
    status: cancel ? ICalEventStatus.CANCELLED : ICalEventStatus.CONFIRMED,
    url: input.url,
  });
  return calendar.toString();
}
