// A subscription feed as iCalendar text: no METHOD (a published calendar, not an invitation), times in UTC, one
// VEVENT per window with a stable UID and a SEQUENCE that grows with every change.
// Reference: RFC 5545 §3.6.1 (VEVENT), §3.8.1.11 (STATUS), §3.8.4.7 (UID), §3.8.7.4 (SEQUENCE); RFC 7986 §5.7
// (REFRESH-INTERVAL, written by ical-generator from `ttl`).
import ical, { ICalEventStatus } from 'ical-generator';

export type FeedEvent = {
  uid: string;
  sequence: number;
  startsAt: Date;
  endsAt: Date;
  summary: string;
  description: string;
  status: 'tentative' | 'confirmed' | 'cancelled';
  url: string;
  lastModified: Date;
};

const STATUS: Record<FeedEvent['status'], ICalEventStatus> = {
  tentative: ICalEventStatus.TENTATIVE,
  confirmed: ICalEventStatus.CONFIRMED,
  cancelled: ICalEventStatus.CANCELLED,
};

/** Calendar apps are asked to fetch again after this many seconds (most poll on their own schedule anyway). */
export const FEED_REFRESH_SECONDS = 3600;

export const FEED_PROD_ID = { company: 'Slackwater', product: 'Calendar feed', language: 'EN' };

export function buildFeedCalendar(name: string, events: FeedEvent[], stamp: Date): string {
  const calendar = ical({ prodId: FEED_PROD_ID, name, ttl: FEED_REFRESH_SECONDS });
  for (const e of events) {
    calendar.createEvent({
      id: e.uid, sequence: e.sequence, stamp, start: e.startsAt, end: e.endsAt, summary: e.summary,
      description: e.description, status: STATUS[e.status], url: e.url, lastModified: e.lastModified,
    });
  }
  return calendar.toString();
}
