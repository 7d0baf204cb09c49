// A window's times as a tenant reads them: in its zone with the zone named, and in UTC beside it.

function dayAndTime(timeZone: string): Intl.DateTimeFormat {
  return new Intl.DateTimeFormat('en-GB', {
    timeZone, weekday: 'short', day: 'numeric', month: 'short', year: 'numeric',
    hour: '2-digit', minute: '2-digit', hourCycle: 'h23',
  });
}

function zoneName(at: Date, timeZone: string): string {
  const part = new Intl.DateTimeFormat('en-GB', { timeZone, timeZoneName: 'short' })
    .formatToParts(at).find((p) => p.type === 'timeZoneName');
  return part?.value ?? timeZone;
}

/** "Thu, 3 Dec 2026, 22:00 – Fri, 4 Dec 2026, 02:00 GMT-1" (the zone's name at the end time). */
export function formatRangeIn(startsAt: Date, endsAt: Date, timeZone: string): string {
  const f = dayAndTime(timeZone);
  return `${f.format(startsAt)} – ${f.format(endsAt)} ${zoneName(endsAt, timeZone)}`;
}

export function formatRangeUtc(startsAt: Date, endsAt: Date): string {
  return formatRangeIn(startsAt, endsAt, 'UTC');
}
