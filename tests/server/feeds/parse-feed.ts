// Parses a feed back with ical.js (an independent parser) into the fields the tests judge, event by event.
import ICAL from 'ical.js';

export type FeedEventFields = {
  uid: string;
  sequence: number | null;
  status: string | null;
  summary: string;
  description: string;
  url: string | null;
  /** DTSTART as written: a UTC value ends in Z */
  startText: string;
  startUtc: string;
};

export type ParsedFeed = { method: string | null; name: string | null; events: FeedEventFields[] };

export function parseFeed(ics: string): ParsedFeed {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  const text = (c: ICAL.Component, name: string) => {
    const value = c.getFirstPropertyValue(name);
    return typeof value === 'string' ? value : value == null ? null : String(value);
  };
  const events = calendar.getAllSubcomponents('vevent').map((event) => {
    const start = event.getFirstPropertyValue('dtstart') as ICAL.Time;
    return {
      uid: text(event, 'uid') ?? '',
      sequence: event.hasProperty('sequence') ? Number(event.getFirstPropertyValue('sequence')) : null,
      status: text(event, 'status'),
      summary: text(event, 'summary') ?? '',
      description: text(event, 'description') ?? '',
      url: text(event, 'url'),
      startText: start.toICALString(),
      startUtc: start.toJSDate().toISOString(),
    };
  });
  return { method: text(calendar, 'method'), name: text(calendar, 'x-wr-calname'), events };
}

/** The event whose UID starts with `windowId` followed by "@" or "." (staff and tenant UIDs), or undefined. */
export function eventOf(feed: ParsedFeed, windowId: string): FeedEventFields | undefined {
  return feed.events.find((e) => e.uid.startsWith(`${windowId}@`) || e.uid.startsWith(`${windowId}.`));
}
