// Parses an invitation back with ical.js (an independent parser) and reads what RFC 5545/5546 require of it.
import ICAL from 'ical.js';

export type ParsedInvitation = {
  method: string | null;
  events: number;
  uid: string[];
  dtstamp: number;
  dtstart: number;
  dtend: number;
  duration: number;
  sequence: number | null;
  sequenceCount: number;
  status: string | null;
  summary: string | null;
  description: string | null;
  startUtc: string | null;
};

export function parseInvitation(ics: string): ParsedInvitation {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  const events = calendar.getAllSubcomponents('vevent');
  const event = events[0];
  const count = (name: string) => event.getAllProperties(name).length;
  const start = event.getFirstPropertyValue('dtstart') as ICAL.Time | null;
  return {
    method: calendar.getFirstPropertyValue('method') as string | null,
    events: events.length,
    uid: event.getAllProperties('uid').map((p) => String(p.getFirstValue())),
    dtstamp: count('dtstamp'),
    dtstart: count('dtstart'),
    dtend: count('dtend'),
    duration: count('duration'),
    sequence: event.hasProperty('sequence') ? Number(event.getFirstPropertyValue('sequence')) : null,
    sequenceCount: count('sequence'),
    status: (event.getFirstPropertyValue('status') as string | null) ?? null,
    summary: (event.getFirstPropertyValue('summary') as string | null) ?? null,
    description: (event.getFirstPropertyValue('description') as string | null) ?? null,
    startUtc: start ? start.toJSDate().toISOString() : null,
  };
}

/**
 * RFC 5545 §3.6.1 (confirmed, REFERENCES.md): a VEVENT has UID (§3.8.4.7) and DTSTAMP (§3.8.7.2) exactly once,
 * DTSTART (§3.8.2.4), and never both DTEND and DURATION; SEQUENCE (§3.8.7.4) at most once.
 * RFC 5546 (secondary): a METHOD on the calendar; SEQUENCE present when above 0.
 */
export function expectRfc5545Event(p: ParsedInvitation): void {
  expect(p.events).toBe(1);
  expect(p.uid).toHaveLength(1);
  expect(p.dtstamp).toBe(1);
  expect(p.dtstart).toBe(1);
  expect(p.dtend > 0 && p.duration > 0).toBe(false);
  expect(p.sequenceCount).toBeLessThanOrEqual(1);
  expect(p.method).not.toBeNull();
}
