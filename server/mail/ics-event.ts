// Reads the first VEVENT of an iCalendar text for display in the Outbox (not a full RFC 5545 parser).
// Reference: RFC 5545 §3.1 (content lines, folding), §3.3.5 (DATE-TIME), §3.3.11 (TEXT escapes).
import type { OutboxEvent, OutboxEventTime } from '../../shared/outbox';

type ContentLine = { name: string; params: Record<string, string>; value: string };

/** Unfolds (CRLF + one space or tab continues a line) and splits into name;params:value lines. */
export function contentLines(ics: string): ContentLine[] {
  const unfolded = ics.replace(/\r?\n[ \t]/g, '');
  const lines: ContentLine[] = [];
  for (const line of unfolded.split(/\r?\n/)) {
    const match = /^([A-Za-z0-9-]+)((?:;[^:]*)?):(.*)$/.exec(line);
    if (!match) continue;
    const params: Record<string, string> = {};
    for (const part of match[2].split(';').slice(1)) {
      const eq = part.indexOf('=');
      if (eq > 0) params[part.slice(0, eq).toUpperCase()] = part.slice(eq + 1).replace(/^"|"$/g, '');
    }
    lines.push({ name: match[1].toUpperCase(), params, value: match[3] });
  }
  return lines;
}

/** The calendar-level METHOD property (RFC 5546 §1.4), or null. */
export function calendarMethod(ics: string): string | null {
  const lines = contentLines(ics);
  const firstComponent = lines.findIndex((l) => l.name === 'BEGIN' && l.value.toUpperCase() !== 'VCALENDAR');
  const head = firstComponent >= 0 ? lines.slice(0, firstComponent) : lines;
  return head.find((l) => l.name === 'METHOD')?.value.trim() ?? null;
}

const unescapeText = (value: string) =>
  value.replace(/\\([\\;,nN])/g, (_m, c: string) => (c === 'n' || c === 'N' ? '\n' : c));

function eventTime(line: ContentLine | undefined): OutboxEventTime | null {
  if (!line) return null;
  const m = /^(\d{4})(\d{2})(\d{2})(?:T(\d{2})(\d{2})(\d{2})(Z)?)?$/.exec(line.value.trim());
  const iso = m?.[7] ? `${m[1]}-${m[2]}-${m[3]}T${m[4]}:${m[5]}:${m[6]}.000Z` : null;
  return { value: line.value.trim(), timeZone: line.params.TZID ?? null, iso };
}

/** The first VEVENT's key properties, or null when the text holds none. */
export function firstEvent(ics: string): OutboxEvent | null {
  const lines = contentLines(ics);
  const begin = lines.findIndex((l) => l.name === 'BEGIN' && l.value.trim().toUpperCase() === 'VEVENT');
  if (begin < 0) return null;
  const props: ContentLine[] = [];
  let depth = 0;
  for (const line of lines.slice(begin + 1)) {
    if (line.name === 'END' && depth === 0) break;
    if (line.name === 'BEGIN') depth += 1;
    else if (line.name === 'END') depth -= 1;
    else if (depth === 0) props.push(line); // skip nested VALARM properties
  }
  const get = (name: string) => props.find((p) => p.name === name);
  const text = (name: string) => {
    const line = get(name);
    return line ? unescapeText(line.value) : null;
  };
  const sequence = get('SEQUENCE');
  return {
    uid: text('UID'),
    summary: text('SUMMARY'),
    start: eventTime(get('DTSTART')),
    end: eventTime(get('DTEND')),
    sequence: sequence && /^\d+$/.test(sequence.value.trim()) ? Number(sequence.value.trim()) : null,
    status: text('STATUS'),
    location: text('LOCATION'),
    organizer: get('ORGANIZER')?.value.replace(/^mailto:/i, '') ?? null,
  };
}
