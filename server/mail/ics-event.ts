// Reads an iCalendar text for display in the Outbox with ical.js: the calendar's METHOD and its first VEVENT.
// Reference: RFC 5545 §3.6.1 (VEVENT), §3.3.5 (DATE-TIME); RFC 5546 §1.4 (METHOD).
import ICAL from 'ical.js';
import type { OutboxEvent, OutboxEventTime } from '../../shared/outbox';

/** The VCALENDAR component, or null when the text does not parse (the Outbox shows it raw instead). */
export function parseCalendar(ics: string): ICAL.Component | null {
  try {
    const jcal: unknown = ICAL.parse(ics);
    // Several calendars in one text come back as a list; the first is the one shown.
    const first = Array.isArray(jcal) && Array.isArray(jcal[0]) ? jcal[0] : jcal;
    return new ICAL.Component(first as unknown[]);
  } catch {
    return null;
  }
}

/** The calendar-level METHOD property, or null. */
export function calendarMethod(calendar: ICAL.Component): string | null {
  const method = calendar.getFirstPropertyValue('method');
  return typeof method === 'string' ? method.trim() : null;
}

function eventTime(event: ICAL.Component, name: string): OutboxEventTime | null {
  const property = event.getFirstProperty(name);
  const time = property?.getFirstValue();
  if (!property || !(time instanceof ICAL.Time)) return null;
  const tzid = property.getParameter('tzid');
  return {
    value: time.toICALString(),
    timeZone: typeof tzid === 'string' ? tzid : null,
    // Only a UTC value is an instant by itself; a zoned one needs its VTIMEZONE, a floating one has none.
    iso: time.zone?.tzid === 'UTC' ? time.toJSDate().toISOString() : null,
  };
}

/** The first VEVENT's key properties (nested VALARMs aside), or null when the calendar holds none. */
export function firstEvent(calendar: ICAL.Component): OutboxEvent | null {
  const event = calendar.getFirstSubcomponent('vevent');
  if (!event) return null;
  const text = (name: string) => {
    const value = event.getFirstPropertyValue(name);
    return typeof value === 'string' ? value : null;
  };
  const sequence = event.getFirstPropertyValue('sequence');
  return {
    uid: text('uid'),
    summary: text('summary'),
    start: eventTime(event, 'dtstart'),
    end: eventTime(event, 'dtend'),
    sequence: typeof sequence === 'number' && Number.isInteger(sequence) ? sequence : null,
    status: text('status'),
    location: text('location'),
    organizer: text('organizer')?.replace(/^mailto:/i, '') ?? null,
  };
}
